import { assessFitnessToTest } from '../../src/acceptance/assessFitnessToTest.ts';
import { estimateTestFringeOrder, type TestFringeOrderEstimate } from '../../src/acceptance/estimateTestFringeOrder.ts';
import type { FitnessAssessment, FitnessCriteria } from '../../src/acceptance/FitnessTypes.ts';
import { analyseSiteStages } from '../../src/residual/analyseSiteStages.ts';
import type { SiteStagesAnalysis, StageName } from '../../src/residual/SiteStagesTypes.ts';
import type { Measured } from '../../src/uncertainty/Measured.ts';
import type { StageAnalysisCalcInput } from '../schemas/calcSchemas.ts';
import { chooseFitnessCriteria } from './chooseFitnessCriteria.ts';
import { JUDGED_RESIDUAL_RULE, latestUnloadedStage } from './latestUnloadedStage.ts';

export interface StageFitness {
  rule: string;
  judgedStage: StageName | null;
  residualOrder: Measured | null;
  residualStressMPa: Measured | null;
  criteriaSource: 'given' | 'common_practice_default';
  criteriaFlag?: string;
  criteria: FitnessCriteria;
  testFringeOrderEstimate: TestFringeOrderEstimate | null;
  /** null when no reading without load was given. */
  assessment: FitnessAssessment | null;
  notes: string[];
}

export interface StageAnalysisCalcResult {
  analysis: SiteStagesAnalysis;
  fitness: StageFitness;
}

const exact = (m: { value: number; uncertainty?: number | undefined }): Measured => ({ value: m.value, uncertainty: m.uncertainty ?? 0 });

/**
 * POST /v1/calc/stage-analysis: every stage quantity at one site, then whether the model is
 * fit to test with the residual it carries now (JUDGED_RESIDUAL_RULE), judged with the same
 * k = 2 guard band the analysis uses for its zero tests.
 *
 * @example
 * calculateStageAnalysis({ fabrication: { order: { value: 0.3, uncertainty: 0.02 }, signKnown: true },
 *   afterAnneal: { order: { value: 0.08, uncertainty: 0.02 }, signKnown: true },
 *   fringeValueNPerMm: { value: 7, uncertainty: 0.2 }, thicknessMm: { value: 6, uncertainty: 0.05 }, onFreeEdge: true });
 * // fitness.judgedStage 'afterAnneal', criteria { maxResidualFringeOrder: 0.2 } (common practice),
 * // assessment.decision 'conforming' (0.08 + 2·0.02 ≤ 0.2)
 */
export function calculateStageAnalysis(input: StageAnalysisCalcInput): StageAnalysisCalcResult {
  const { criteria: givenCriteria, plannedTest, ...stages } = input;
  const analysis = analyseSiteStages(stages);
  const judged = latestUnloadedStage(new Set(Object.keys(analysis.stages) as StageName[]));
  const chosen = chooseFitnessCriteria(givenCriteria, plannedTest !== undefined);
  const estimate = plannedTest
    ? estimateTestFringeOrder({
        plannedLoadN: exact(plannedTest.plannedLoadN),
        netWidthMm: exact(plannedTest.netWidthMm),
        kt: exact(plannedTest.kt),
        thicknessMm: input.thicknessMm,
        fringeValueNPerMm: input.fringeValueNPerMm,
      })
    : null;
  const residual = judged.stage === null ? undefined : analysis.stages[judged.stage];
  const assessment = residual
    ? assessFitnessToTest({
        residualOrder: residual.order,
        residualStressMPa: residual.stress.stressMPa,
        criteria: chosen.criteria,
        coverageFactor: analysis.coverageFactor,
        ...(estimate ? { testFringeOrder: estimate.testFringeOrder } : {}),
      })
    : null;
  const stressNote =
    residual && !input.onFreeEdge && chosen.criteria.maxResidualStressMPa !== undefined
      ? ['away from a free edge the stress judged is σ1 − σ2, not a single stress']
      : [];
  return {
    analysis,
    fitness: {
      rule: JUDGED_RESIDUAL_RULE,
      judgedStage: judged.stage,
      residualOrder: residual?.order ?? null,
      residualStressMPa: residual?.stress.stressMPa ?? null,
      criteriaSource: chosen.source,
      ...(chosen.flag ? { criteriaFlag: chosen.flag } : {}),
      criteria: chosen.criteria,
      testFringeOrderEstimate: estimate,
      assessment,
      notes: [...judged.notes, ...chosen.notes, ...stressNote, 'the residual is judged by its magnitude, so an assumed sign does not change the decision'],
    },
  };
}
