import { COMMON_PRACTICE_FITNESS_CRITERIA } from '../../src/acceptance/commonPracticeFitnessCriteria.ts';
import type { FitnessCriteria } from '../../src/acceptance/FitnessTypes.ts';

export interface ChosenCriteria {
  criteria: FitnessCriteria;
  source: 'given' | 'common_practice_default';
  flag?: string;
  notes: string[];
}

/**
 * The limits a stage analysis judges against: the caller's, else the common-practice 'usual'
 * set, flagged, and without its fraction criterion when no planned test lets it be evaluated
 * (a default must not turn into a demand the caller never made).
 *
 * @example
 * chooseFitnessCriteria(undefined, false);
 * // { criteria: { maxResidualFringeOrder: 0.2 }, source: 'common_practice_default',
 * //   flag: '[M] common practice: ...', notes: ['...fraction criterion left out...'] }
 */
export function chooseFitnessCriteria(given: FitnessCriteria | undefined, hasPlannedTest: boolean): ChosenCriteria {
  if (given !== undefined) return { criteria: given, source: 'given', notes: [] };
  const { maxResidualFractionOfTestOrder, ...withoutFraction } = COMMON_PRACTICE_FITNESS_CRITERIA.usual;
  const common = { source: 'common_practice_default' as const, flag: COMMON_PRACTICE_FITNESS_CRITERIA.flag };
  if (hasPlannedTest) {
    return { ...common, criteria: { ...withoutFraction, maxResidualFractionOfTestOrder }, notes: ['no criteria given: common-practice limits used'] };
  }
  return {
    ...common,
    criteria: withoutFraction,
    notes: ['no criteria given: common-practice limits used; the fraction-of-test-order criterion was left out because no planned test was given'],
  };
}
