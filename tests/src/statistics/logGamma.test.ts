import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { DomainError } from '../../../src/errors/DomainError.ts';
import { logGamma } from '../../../src/statistics/logGamma.ts';
import { jStat } from './jstatReference.ts';

describe('logGamma', () => {
  it('gives ln((n − 1)!) at the integers [C: Γ(n) = (n − 1)!]', () => {
    let factorial = 1;
    for (let n = 1; n <= 30; n++) {
      expect(logGamma(n)).toBeCloseTo(Math.log(factorial), 11);
      factorial *= n;
    }
  });
  it('gives ln √π at ½ and ln(√π/2) at 3/2 [C: Γ(½) = √π]', () => {
    expect(logGamma(0.5)).toBeCloseTo(0.5 * Math.log(Math.PI), 13);
    expect(logGamma(1.5)).toBeCloseTo(Math.log(Math.sqrt(Math.PI) / 2), 13);
  });
  it('agrees with jstat.gammaln (reference library) over 1e-3..1e5', () => {
    for (const x of [0.001, 0.01, 0.1, 0.3, 0.7, 1.2, 2.5, 7.3, 19.9, 55.5, 170.6, 1e3, 1e5]) {
      const reference = jStat.gammaln(x);
      expect(Math.abs(logGamma(x) - reference)).toBeLessThan(1e-10 * Math.max(1, Math.abs(reference)));
    }
  });
  it('satisfies ln Γ(x + 1) = ln Γ(x) + ln x [C: recurrence]', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.01, max: 500, noNaN: true }), (x) => {
        expect(logGamma(x + 1)).toBeCloseTo(logGamma(x) + Math.log(x), 9);
      }),
    );
  });
  it('refuses non-positive arguments', () => {
    expect(() => logGamma(0)).toThrow(DomainError);
    expect(() => logGamma(-1.5)).toThrow(DomainError);
  });
});
