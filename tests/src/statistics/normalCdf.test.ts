import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { DomainError } from '../../../src/errors/DomainError.ts';
import { normalCdf } from '../../../src/statistics/normalCdf.ts';
import { jStat } from './jstatReference.ts';

describe('normalCdf', () => {
  it('agrees with jstat.normal.cdf (reference library) to 1e-12 relative, tails included', () => {
    for (let x = -37; x <= 8; x += 0.25) {
      const reference = jStat.normal.cdf(x, 0, 1);
      expect(Math.abs(normalCdf(x) - reference)).toBeLessThanOrEqual(1e-12 * reference + 1e-16);
    }
  });
  it('puts 97.5 % below z = 1.959964 and 84.13 % below z = 1 [M: standard normal table]', () => {
    expect(normalCdf(1.959964)).toBeCloseTo(0.975, 6);
    expect(normalCdf(1)).toBeCloseTo(0.841345, 6);
    expect(normalCdf(0)).toBe(0.5);
  });
  it('is symmetric, Φ(x) + Φ(−x) = 1, and non-decreasing [C]', () => {
    fc.assert(
      fc.property(fc.double({ min: -40, max: 40, noNaN: true }), fc.double({ min: 0, max: 5, noNaN: true }), (x, dx) => {
        expect(normalCdf(x) + normalCdf(-x)).toBeCloseTo(1, 14);
        expect(normalCdf(x + dx)).toBeGreaterThanOrEqual(normalCdf(x));
      }),
    );
  });
  it('refuses NaN', () => {
    expect(() => normalCdf(Number.NaN)).toThrow(DomainError);
  });
});
