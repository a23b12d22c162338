import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { DomainError } from '../../../src/errors/DomainError.ts';
import { regularizedIncompleteBeta } from '../../../src/statistics/regularizedIncompleteBeta.ts';
import { jStat } from './jstatReference.ts';

const unit = fc.double({ min: 0.001, max: 0.999, noNaN: true });
const shape = fc.double({ min: 0.05, max: 200, noNaN: true });

describe('regularizedIncompleteBeta', () => {
  it('reduces to xᵃ for b = 1 and to 1 − (1 − x)ᵇ for a = 1 [C: closed forms]', () => {
    fc.assert(
      fc.property(unit, fc.double({ min: 0.1, max: 50, noNaN: true }), (x, s) => {
        expect(regularizedIncompleteBeta(x, s, 1)).toBeCloseTo(x ** s, 12);
        expect(regularizedIncompleteBeta(x, 1, s)).toBeCloseTo(1 - (1 - x) ** s, 12);
      }),
    );
  });
  it('equals the binomial upper tail, I_p(k, n − k + 1) = P(X ≥ k) for X ~ Bin(n, p) [C]', () => {
    const n = 12;
    const p = 0.3;
    const choose = (m: number, k: number): number => (k === 0 ? 1 : (choose(m, k - 1) * (m - k + 1)) / k);
    for (let k = 1; k <= n; k++) {
      let tail = 0;
      for (let j = k; j <= n; j++) tail += choose(n, j) * p ** j * (1 - p) ** (n - j);
      expect(regularizedIncompleteBeta(p, k, n - k + 1)).toBeCloseTo(tail, 13);
    }
  });
  it('is symmetric: I_x(a, b) = 1 − I_{1−x}(b, a) [C]', () => {
    fc.assert(
      fc.property(unit, shape, shape, (x, a, b) => {
        expect(regularizedIncompleteBeta(x, a, b) + regularizedIncompleteBeta(1 - x, b, a)).toBeCloseTo(1, 10);
      }),
    );
  });
  // jstat's continued fraction stops once a step changes the value by less than 3e-7
  // (read in its source), so it is a loose reference: agreement is asked to 1e-6.
  it('agrees with jstat.ibeta (reference library) on a grid to 1e-6', () => {
    for (const a of [0.5, 1.5, 3, 10, 45.5]) {
      for (const b of [0.5, 2, 7.5, 30]) {
        for (const x of [0.01, 0.2, 0.5, 0.8, 0.99]) {
          expect(regularizedIncompleteBeta(x, a, b)).toBeCloseTo(jStat.ibeta(x, a, b), 6);
        }
      }
    }
  });
  it('is exactly 0 and 1 at the ends and refuses x outside 0..1', () => {
    expect(regularizedIncompleteBeta(0, 2, 3)).toBe(0);
    expect(regularizedIncompleteBeta(1, 2, 3)).toBe(1);
    expect(() => regularizedIncompleteBeta(1.1, 2, 3)).toThrow(DomainError);
    expect(() => regularizedIncompleteBeta(0.5, 0, 3)).toThrow(DomainError);
  });
});
