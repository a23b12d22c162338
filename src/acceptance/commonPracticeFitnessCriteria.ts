import type { FitnessCriteria } from './FitnessTypes.ts';

/**
 * Residual limits photoelastic laboratories commonly work to, recalled from practice rather
 * than read in a standard. Every criterion given must pass, so `usual` takes the lenient end
 * of each range and `strict` the tight end.
 */
export const COMMON_PRACTICE_FITNESS_CRITERIA = {
  flag: '[M] common practice: below about 0.1–0.2 fringe, or 5–10 % of the largest test order',
  usual: { maxResidualFringeOrder: 0.2, maxResidualFractionOfTestOrder: 0.1 },
  strict: { maxResidualFringeOrder: 0.1, maxResidualFractionOfTestOrder: 0.05 },
} as const satisfies { flag: string; usual: FitnessCriteria; strict: FitnessCriteria };
