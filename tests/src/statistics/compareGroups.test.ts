import { describe, expect, it } from 'vitest';
import { compareGroups } from '../../../src/statistics/compareGroups.ts';
import { mannWhitneyU } from '../../../src/statistics/mannWhitneyU.ts';
import { welchComparison } from '../../../src/statistics/welchComparison.ts';

const batchA = [0.12, 0.15, 0.11, 0.14, 0.13];
const batchB = [0.2, 0.18, 0.23, 0.21, 0.19, 0.22];

describe('compareGroups', () => {
  it('declines with a reason when either group has fewer than 3 values', () => {
    const r = compareGroups([0.12, 0.15], batchB);
    expect(r).toMatchObject({ decided: false, nA: 2, nB: 6 });
    expect(r.decided === false && r.reason).toMatch(/group a has 2/);
    expect(compareGroups(batchA, [0.2]).decided).toBe(false);
  });
  it('returns Welch and Mann–Whitney side by side, as each alone gives them', () => {
    const r = compareGroups(batchA, batchB, 0.9);
    expect(r).toEqual({
      decided: true,
      nA: 5,
      nB: 6,
      welch: welchComparison(batchA, batchB, 0.9),
      mannWhitney: mannWhitneyU(batchA, batchB),
    });
  });
});
