import fc from 'fast-check';
import { linearRegression } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import { DomainError } from '../../../src/errors/DomainError.ts';
import { ordinaryLeastSquaresLine, type LineFit } from '../../../src/statistics/ordinaryLeastSquaresLine.ts';
import { jStat } from './jstatReference.ts';

const fitOf = (x: number[], y: number[]): LineFit => {
  const fit = ordinaryLeastSquaresLine(x, y);
  if (!fit.defined) throw new Error(fit.reason);
  return fit;
};

const data = fc
  .array(fc.tuple(fc.integer({ min: 0, max: 400 }), fc.integer({ min: -500, max: 500 })), { minLength: 3, maxLength: 30 })
  .filter((pts) => new Set(pts.map(([x]) => x)).size > 1)
  .map((pts) => ({ x: pts.map(([x]) => x), y: pts.map(([, y]) => y / 1000) }));

describe('ordinaryLeastSquaresLine', () => {
  it('works a five-point line by hand [C]', () => {
    // x̄ = 2, ȳ = 3.2, Sxx = 10, Sxy = 11, RSS = 2.7, s² = 0.9
    const fit = fitOf([0, 1, 2, 3, 4], [1, 2, 4, 3, 6]);
    expect(fit.slope.value).toBeCloseTo(1.1, 14);
    expect(fit.intercept.value).toBeCloseTo(1, 14);
    expect(fit.residualSumOfSquares).toBeCloseTo(2.7, 14);
    expect(fit.slope.uncertainty).toBeCloseTo(Math.sqrt(0.09), 14);
    expect(fit.intercept.uncertainty).toBeCloseTo(Math.sqrt(0.9 * (1 / 5 + 4 / 10)), 14);
    expect(fit.covarianceInterceptSlope).toBeCloseTo((-2 * 0.9) / 10, 14);
    expect(fit.rSquared).toBeCloseTo(1 - 2.7 / 14.8, 14);
  });
  it('agrees with simple-statistics linearRegression on the coefficients (reference library)', () => {
    fc.assert(
      fc.property(data, ({ x, y }) => {
        const reference = linearRegression(x.map((xi, i) => [xi, y[i]!]));
        const fit = fitOf(x, y);
        expect(fit.slope.value).toBeCloseTo(reference.m, 10);
        expect(fit.intercept.value).toBeCloseTo(reference.b, 8);
      }),
    );
  });
  it('agrees with jstat models.ols on standard errors and R² (reference library)', () => {
    fc.assert(
      fc.property(data, ({ x, y }) => {
        const reference = jStat.models.ols(y, x.map((xi) => [1, xi]));
        const fit = fitOf(x, y);
        expect(fit.intercept.uncertainty).toBeCloseTo(reference.t.se[0]!, 8);
        expect(fit.slope.uncertainty).toBeCloseTo(reference.t.se[1]!, 10);
        if (fit.rSquared !== null && Number.isFinite(reference.R2)) expect(fit.rSquared).toBeCloseTo(reference.R2, 8);
      }),
      { numRuns: 60 },
    );
  });
  it('is undefined with fewer than 3 points or a single x; refuses mismatched lengths', () => {
    expect(ordinaryLeastSquaresLine([1, 2], [0.1, 0.2]).defined).toBe(false);
    expect(ordinaryLeastSquaresLine([5, 5, 5], [0.1, 0.2, 0.3]).defined).toBe(false);
    expect(() => ordinaryLeastSquaresLine([1, 2, 3], [0.1, 0.2])).toThrow(DomainError);
    expect(fitOf([1, 2, 3], [0.2, 0.2, 0.2]).rSquared).toBeNull();
  });
});
