import { mannWhitneyU, type MannWhitneyOutcome } from './mannWhitneyU.ts';
import { welchComparison, type WelchOutcome } from './welchComparison.ts';

// Below three values a side, a variance rests on one or two differences and ranks on a
// handful of orderings: too little to tell groups apart.
const MINIMUM_GROUP_SIZE = 3;

export type GroupComparison =
  | { decided: false; reason: string; nA: number; nB: number }
  | { decided: true; nA: number; nB: number; welch: WelchOutcome; mannWhitney: MannWhitneyOutcome };

/**
 * Compares two groups (e.g. residual fringe orders of two material batches) by Welch's t on
 * the means and Mann–Whitney U on the ranks, side by side: when they disagree, outliers or
 * skew are at work. With fewer than 3 values on either side it declines:
 * `{ decided: false, reason }`.
 *
 * @example
 * compareGroups([0.12, 0.15], [0.2, 0.18, 0.23]);
 * // { decided: false, reason: 'group a has 2 values; at least 3 per group are needed', nA: 2, nB: 3 }
 */
export function compareGroups(a: readonly number[], b: readonly number[], confidence = 0.95): GroupComparison {
  for (const [name, group] of [['a', a], ['b', b]] as const) {
    if (group.length < MINIMUM_GROUP_SIZE) {
      return {
        decided: false,
        reason: `group ${name} has ${group.length} values; at least ${MINIMUM_GROUP_SIZE} per group are needed`,
        nA: a.length,
        nB: b.length,
      };
    }
  }
  return {
    decided: true,
    nA: a.length,
    nB: b.length,
    welch: welchComparison(a, b, confidence),
    mannWhitney: mannWhitneyU(a, b),
  };
}
