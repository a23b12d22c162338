import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { DomainError } from '../../../src/errors/DomainError.ts';
import { mannWhitneyU, type MannWhitneyOutcome, type MannWhitneyResult } from '../../../src/statistics/mannWhitneyU.ts';
import { jStat } from './jstatReference.ts';

const defined = (outcome: MannWhitneyOutcome): MannWhitneyResult => {
  if (!outcome.defined) throw new Error(outcome.reason);
  return outcome;
};

// Small integers make ties common, which is the case worth exercising.
const group = fc.array(fc.integer({ min: 0, max: 6 }), { minLength: 1, maxLength: 20 });
const notAllTied = (a: number[], b: number[]): boolean => new Set([...a, ...b]).size > 1;

describe('mannWhitneyU', () => {
  it('works a case without ties by hand: 1, 2, 3 against 4, 5, 6 [C]', () => {
    const r = defined(mannWhitneyU([1, 2, 3], [4, 5, 6]));
    expect([r.uA, r.uB, r.u]).toEqual([0, 9, 0]);
    // σ² = 3·3/12·7 = 5.25; |0 − 4.5| less the continuity half = 4
    expect(r.z).toBeCloseTo(-4 / Math.sqrt(5.25), 14);
    expect(r.pTwoSided).toBeCloseTo(2 * jStat.normal.cdf(-4 / Math.sqrt(5.25), 0, 1), 12);
    expect(r.rankBiserial).toBe(-1);
  });
  it('works a case with a triple tie by hand: 1, 2, 2 against 2, 3, 4 [C]', () => {
    const r = defined(mannWhitneyU([1, 2, 2], [2, 3, 4]));
    // mid-rank 3 for the three 2s; R_a = 1 + 3 + 3 = 7, U_a = 7 − 6 = 1
    expect(r.uA).toBe(1);
    // σ² = 9/12·(7 − (27 − 3)/(6·5)) = 4.65
    expect(r.z).toBeCloseTo(-3 / Math.sqrt(4.65), 14);
    expect(r.rankBiserial).toBeCloseTo(-7 / 9, 14);
  });
  it('equals the pair count #(a > b) + ½·#(a = b), the definition of U [C]', () => {
    fc.assert(
      fc.property(group, group, (a, b) => {
        fc.pre(notAllTied(a, b));
        let pairs = 0;
        for (const x of a) for (const y of b) pairs += x > y ? 1 : x === y ? 0.5 : 0;
        expect(defined(mannWhitneyU(a, b)).uA).toBeCloseTo(pairs, 9);
      }),
    );
  });
  it('has U_a + U_b = n_a·n_b, and swapping groups negates z and the effect size', () => {
    fc.assert(
      fc.property(group, group, (a, b) => {
        fc.pre(notAllTied(a, b));
        const ab = defined(mannWhitneyU(a, b));
        const ba = defined(mannWhitneyU(b, a));
        expect(ab.uA + ab.uB).toBeCloseTo(a.length * b.length, 9);
        expect(ba.uA).toBeCloseTo(ab.uB, 9);
        expect(ba.z).toBeCloseTo(-ab.z, 12);
        expect(ba.rankBiserial).toBeCloseTo(-ab.rankBiserial, 12);
        expect(ab.pTwoSided).toBeGreaterThan(0);
        expect(ab.pTwoSided).toBeLessThanOrEqual(1);
      }),
    );
  });
  it('is undefined when every value is tied, and refuses an empty group', () => {
    expect(mannWhitneyU([0.2, 0.2], [0.2]).defined).toBe(false);
    expect(() => mannWhitneyU([], [0.1])).toThrow(DomainError);
  });
});
