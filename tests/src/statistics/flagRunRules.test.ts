import { describe, expect, it } from 'vitest';
import { flagRunRules } from '../../../src/statistics/flagRunRules.ts';

// Centre line 0 and limits ±3 (σ = 1) throughout; series are built so that only the rule
// under test can fire. The counts are the Western Electric / Nelson ones [M].
const flagged = (values: number[], rule: string, options = {}): number[] =>
  flagRunRules(values, 0, 3, options).flatMap((rules, i) => (rules.some((r) => r === rule) ? [i] : []));

describe('flagRunRules', () => {
  it('flags points strictly beyond the limits, not on them', () => {
    expect(flagged([0, 3.1, -3.1, 3, -3], 'beyond_limits')).toEqual([1, 2]);
  });
  it('flags every point of 8 in a row on one side, and none of 7', () => {
    const eight = [1, 2, 1, 2, 1, 2, 1, 2];
    expect(flagged([-1, ...eight, -1], 'run_of_8_one_side')).toEqual([1, 2, 3, 4, 5, 6, 7, 8]);
    expect(flagged([-1, ...eight.slice(1), -1], 'run_of_8_one_side')).toEqual([]);
  });
  it('lets a point on the centre line end a run', () => {
    expect(flagged([1, 2, 1, 2, 0, 1, 2, 1, 2], 'run_of_8_one_side')).toEqual([]);
  });
  it('flags every point of 6 steadily rising or falling, and none of 5 or of a stalled trend', () => {
    expect(flagged([1, -2, -1.5, -1, 1, 1.5, 2, 0], 'trend_of_6')).toEqual([1, 2, 3, 4, 5, 6]);
    expect(flagged([2, 1.5, 1, 0.5, 0, -0.5], 'trend_of_6')).toEqual([0, 1, 2, 3, 4, 5]);
    expect(flagged([-2, -1.5, -1, 1, 1.5], 'trend_of_6')).toEqual([]);
    expect(flagged([-2, -1.5, -1, -1, 1, 1.5], 'trend_of_6')).toEqual([]);
  });
  it('applies 2 of 3 beyond 2σ only when asked, and only on one side', () => {
    expect(flagged([2.5, 0, 2.2], 'two_of_three_beyond_2_sigma')).toEqual([]);
    expect(flagged([2.5, 0, 2.2], 'two_of_three_beyond_2_sigma', { twoOfThreeBeyondTwoSigma: true })).toEqual([0, 2]);
    expect(flagged([2.5, -2.5, 0], 'two_of_three_beyond_2_sigma', { twoOfThreeBeyondTwoSigma: true })).toEqual([]);
  });
  it('lists a rule once per point even when several windows include it', () => {
    const rules = flagRunRules([2.5, 2.6, 2.7, 0], 0, 3, { twoOfThreeBeyondTwoSigma: true });
    expect(rules[1]).toEqual(['two_of_three_beyond_2_sigma']);
  });
});
