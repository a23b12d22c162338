import type { Measured } from '../uncertainty/Measured.ts';
import type { GuardBandResult } from './decideWithGuardBand.ts';

/** Upper limits on the residual a model may carry into a test; give any subset. */
export interface FitnessCriteria {
  maxResidualFringeOrder?: number;
  maxResidualStressMPa?: number;
  /** Residual order over the largest fringe order the test will produce. */
  maxResidualFractionOfTestOrder?: number;
}

export type CriterionName = keyof FitnessCriteria;

export interface FitnessInput {
  /** The latest residual that applies at the site (after anneal, before anneal, after unload or fabrication). */
  residualOrder: Measured;
  residualStressMPa?: Measured;
  /** Needed for maxResidualFractionOfTestOrder, e.g. from estimateTestFringeOrder. */
  testFringeOrder?: Measured;
  criteria: FitnessCriteria;
  coverageFactor?: number;
}

export type CriterionResult =
  | {
      criterion: CriterionName;
      evaluated: true;
      limit: number;
      /** Magnitude judged against the limit, with its standard uncertainty. */
      judged: Measured;
      guardBand: GuardBandResult;
    }
  | {
      criterion: CriterionName;
      evaluated: false;
      limit: number;
      decision: 'undecided';
      reason: string;
    };

export type FitnessDecision = 'conforming' | 'needs_annealing' | 'undecided';

export interface FitnessAssessment {
  decision: FitnessDecision;
  coverageFactor: number;
  criteria: CriterionResult[];
}
