import fc from 'fast-check';
import { sampleStandardDeviation as referenceSd } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import { DomainError } from '../../../src/errors/DomainError.ts';
import { sampleStandardDeviation } from '../../../src/statistics/sampleStandardDeviation.ts';

describe('sampleStandardDeviation', () => {
  it('gives √(32/7) for 2, 4, 4, 4, 5, 5, 7, 9 [C: squared deviations sum to 32]', () => {
    expect(sampleStandardDeviation([2, 4, 4, 4, 5, 5, 7, 9])).toBeCloseTo(Math.sqrt(32 / 7), 14);
  });
  it('agrees with simple-statistics sampleStandardDeviation (reference library, n − 1 divisor)', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: -100, max: 100, noNaN: true }), { minLength: 2, maxLength: 40 }), (xs) => {
        expect(sampleStandardDeviation(xs)).toBeCloseTo(referenceSd(xs), 9);
      }),
    );
  });
  it('stays accurate for a small spread on a large offset (two-pass) [C]', () => {
    expect(sampleStandardDeviation([1e9 + 0.1, 1e9 + 0.2, 1e9 + 0.3])).toBeCloseTo(0.1, 6);
  });
  it('refuses fewer than two values', () => {
    expect(() => sampleStandardDeviation([0.2])).toThrow(DomainError);
  });
});
