import fc from 'fast-check';
import { quantileSorted } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import { DomainError } from '../../../src/errors/DomainError.ts';
import { percentileLinear } from '../../../src/statistics/percentileLinear.ts';

const sorted = fc
  .array(fc.double({ min: -50, max: 50, noNaN: true }), { minLength: 1, maxLength: 40 })
  .map((xs) => [...xs].sort((a, b) => a - b));

describe('percentileLinear', () => {
  it('reproduces percentile_cont over 1, 2, 3, 4 at 0, ¼, ½, ¾, 1 → 1, 1.75, 2.5, 3.25, 4 [R: jOOQ manual, PERCENTILE_CONT page, PostgreSQL dialect]', () => {
    const got = [0, 0.25, 0.5, 0.75, 1].map((p) => percentileLinear([1, 2, 3, 4], p));
    expect(got).toEqual([1, 1.75, 2.5, 3.25, 4]);
  });
  // simple-statistics' quantileSorted is Hyndman–Fan type 7 (read in its source), the same
  // definition as percentile_cont: h = (n − 1)p with linear interpolation.
  it('agrees with simple-statistics quantileSorted (reference library, type 7)', () => {
    fc.assert(
      fc.property(sorted, fc.double({ min: 0, max: 1, noNaN: true }), (xs, p) => {
        expect(percentileLinear(xs, p)).toBeCloseTo(quantileSorted(xs, p), 10);
      }),
    );
  });
  it('stays within the data and is non-decreasing in p [C]', () => {
    fc.assert(
      fc.property(sorted, fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: 0, max: 1, noNaN: true }), (xs, p, q) => {
        const [lo, hi] = p <= q ? [p, q] : [q, p];
        expect(percentileLinear(xs, lo)).toBeLessThanOrEqual(percentileLinear(xs, hi) + 1e-12);
        expect(percentileLinear(xs, lo)).toBeGreaterThanOrEqual(xs[0]!);
        expect(percentileLinear(xs, hi)).toBeLessThanOrEqual(xs[xs.length - 1]!);
      }),
    );
  });
  it('refuses unsorted or empty input and p outside 0..1', () => {
    expect(() => percentileLinear([0.3, 0.1], 0.5)).toThrow(/ascending/);
    expect(() => percentileLinear([], 0.5)).toThrow(DomainError);
    expect(() => percentileLinear([0.1], 1.5)).toThrow(DomainError);
  });
});
