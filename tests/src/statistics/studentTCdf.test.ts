import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { DomainError } from '../../../src/errors/DomainError.ts';
import { normalCdf } from '../../../src/statistics/normalCdf.ts';
import { studentTCdf } from '../../../src/statistics/studentTCdf.ts';
import { jStat } from './jstatReference.ts';

const t = fc.double({ min: -1e4, max: 1e4, noNaN: true });

describe('studentTCdf', () => {
  it('matches the closed forms for 1, 2 and 3 degrees of freedom [C]', () => {
    fc.assert(
      fc.property(t, (x) => {
        expect(studentTCdf(x, 1)).toBeCloseTo(0.5 + Math.atan(x) / Math.PI, 12);
        expect(studentTCdf(x, 2)).toBeCloseTo(0.5 + x / (2 * Math.sqrt(2 + x * x)), 12);
        const u = x / Math.sqrt(3);
        expect(studentTCdf(x, 3)).toBeCloseTo(0.5 + (Math.atan(u) + u / (1 + u * u)) / Math.PI, 12);
      }),
    );
  });
  it('keeps relative precision deep in the lower tail (Cauchy, t = −1e6) [C]', () => {
    // For the Cauchy distribution P(T < −x) = atan(1/x)/π, which is ≈ 1/(πx) for large x.
    expect(studentTCdf(-1e6, 1) / (Math.atan(1e-6) / Math.PI)).toBeCloseTo(1, 10);
  });
  // jstat evaluates the same incomplete beta but stops at a 3e-7 step (read in its source),
  // and drifts for very large ν; it is compared to 1e-6 for ν up to 1e4.
  it('agrees with jstat.studentt.cdf (reference library) on a grid to 1e-6', () => {
    for (const nu of [0.5, 1, 2.5, 4, 7.3, 10, 29.6, 100, 1e3, 1e4]) {
      for (const x of [-50, -6, -2.5, -1, -0.2, 0, 0.4, 1.7, 3, 12]) {
        expect(studentTCdf(x, nu)).toBeCloseTo(jStat.studentt.cdf(x, nu), 6);
      }
    }
  });
  it('tends to the normal CDF as ν grows, within the first-order term φ(t)(t³ + t)/(4ν) [C]', () => {
    for (const x of [-3, -1, 0.5, 2]) {
      const nu = 1e5;
      const firstOrder = (Math.exp(-x * x / 2) / Math.sqrt(2 * Math.PI)) * (x ** 3 + x) / (4 * nu);
      expect(studentTCdf(x, nu)).toBeCloseTo(normalCdf(x) - firstOrder, 9);
    }
  });
  it('is symmetric: F(t) + F(−t) = 1 [C]', () => {
    fc.assert(
      fc.property(t, fc.double({ min: 0.2, max: 500, noNaN: true }), (x, nu) => {
        expect(studentTCdf(x, nu) + studentTCdf(-x, nu)).toBeCloseTo(1, 12);
      }),
    );
  });
  it('refuses non-positive degrees of freedom', () => {
    expect(() => studentTCdf(1, 0)).toThrow(DomainError);
  });
});
