import fc from 'fast-check';
import { mean, sampleVariance } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import { DomainError } from '../../../src/errors/DomainError.ts';
import { welchComparison, type WelchOutcome, type WelchResult } from '../../../src/statistics/welchComparison.ts';
import { jStat } from './jstatReference.ts';

const defined = (outcome: WelchOutcome): WelchResult => {
  if (!outcome.defined) throw new Error(outcome.reason);
  return outcome;
};

// Readings to 0.01 fringe with at least two distinct values, so the comparison is defined
// (and no subnormal spread underflows to zero).
const group = fc
  .array(fc.integer({ min: -1000, max: 1000 }).map((i) => i / 100), { minLength: 2, maxLength: 25 })
  .filter((xs) => new Set(xs).size > 1);

describe('welchComparison', () => {
  it('works a small case by hand: 1, 2, 3 against 4, 5, 6 [C, with t(0.975, 4) = 2.776 from the t table, M]', () => {
    const r = defined(welchComparison([1, 2, 3], [4, 5, 6]));
    expect(r.differenceOfMeans).toBe(-3);
    expect(r.standardError).toBeCloseTo(Math.sqrt(2 / 3), 14);
    expect(r.degreesOfFreedom).toBeCloseTo(4, 12);
    expect(r.tStatistic).toBeCloseTo(-3 / Math.sqrt(2 / 3), 12);
    expect(r.confidenceInterval.lower).toBeCloseTo(-3 - 2.776 * Math.sqrt(2 / 3), 3);
    expect(r.confidenceInterval.upper).toBeCloseTo(-3 + 2.776 * Math.sqrt(2 / 3), 3);
  });
  it('agrees with a computation on jstat (reference library: t quantile and CDF) and simple-statistics moments', () => {
    fc.assert(
      fc.property(group, group, fc.constantFrom(0.9, 0.95, 0.99), (a, b, confidence) => {
        const va = sampleVariance(a) / a.length;
        const vb = sampleVariance(b) / b.length;
        const se = Math.sqrt(va + vb);
        const df = (va + vb) ** 2 / (va ** 2 / (a.length - 1) + vb ** 2 / (b.length - 1));
        const t = (mean(a) - mean(b)) / se;
        const r = defined(welchComparison(a, b, confidence));
        expect(r.degreesOfFreedom).toBeCloseTo(df, 8);
        expect(r.tStatistic).toBeCloseTo(t, 8);
        expect(r.pTwoSided).toBeCloseTo(2 * jStat.studentt.cdf(-Math.abs(t), df), 6);
        const half = jStat.studentt.inv(1 - (1 - confidence) / 2, df) * se;
        expect(r.confidenceInterval.upper - r.differenceOfMeans).toBeCloseTo(half, 5);
      }),
    );
  });
  it('gives 2(n − 1) degrees of freedom for equal sizes and equal variances [C: Welch–Satterthwaite]', () => {
    fc.assert(
      fc.property(group, fc.integer({ min: -500, max: 500 }), (a, shift) => {
        const r = defined(welchComparison(a, a.map((v) => v + shift / 100).reverse()));
        expect(r.degreesOfFreedom).toBeCloseTo(2 * (a.length - 1), 6);
      }),
    );
  });
  it('has an interval that contains the difference, and swapping groups mirrors everything', () => {
    fc.assert(
      fc.property(group, group, (a, b) => {
        const ab = defined(welchComparison(a, b));
        const ba = defined(welchComparison(b, a));
        expect(ab.confidenceInterval.lower).toBeLessThanOrEqual(ab.differenceOfMeans);
        expect(ab.confidenceInterval.upper).toBeGreaterThanOrEqual(ab.differenceOfMeans);
        expect(ba.differenceOfMeans).toBeCloseTo(-ab.differenceOfMeans, 12);
        expect(ba.confidenceInterval.lower).toBeCloseTo(-ab.confidenceInterval.upper, 10);
        expect(ba.pTwoSided).toBeCloseTo(ab.pTwoSided, 12);
      }),
    );
  });
  it('is undefined with fewer than two values a side or no spread at all, and refuses a bad confidence', () => {
    expect(welchComparison([0.1], [0.2, 0.3]).defined).toBe(false);
    expect(welchComparison([0.1, 0.1], [0.2, 0.2]).defined).toBe(false);
    expect(() => welchComparison([1, 2], [3, 4], 1)).toThrow(DomainError);
    expect(() => welchComparison([1, 2], [3, 4], 0)).toThrow(DomainError);
  });
});
