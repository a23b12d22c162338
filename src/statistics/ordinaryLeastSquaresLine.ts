import { DomainError } from '../errors/DomainError.ts';
import { requireNumber } from '../guards/requireNumber.ts';
import type { Measured } from '../uncertainty/Measured.ts';

export interface LineFit {
  defined: true;
  n: number;
  /** a in y = a + b·x, with its standard error. */
  intercept: Measured;
  /** b in y = a + b·x, with its standard error. */
  slope: Measured;
  /** Cov(a, b) = −x̄·s²/Sxx, needed to propagate into anything computed from both. */
  covarianceInterceptSlope: number;
  residualSumOfSquares: number;
  /** s = √(RSS/(n − 2)). */
  residualStandardError: number;
  /** 1 − RSS/SST; null when y has no spread (0/0). */
  rSquared: number | null;
  adjustedRSquared: number | null;
}

/**
 * Ordinary least-squares straight line y = a + b·x with the classical standard errors from
 * the residual variance s² = RSS/(n − 2): Var(b) = s²/Sxx, Var(a) = s²(1/n + x̄²/Sxx).
 * Needs at least 3 points (one residual degree of freedom) and x values that are not all
 * equal; otherwise returns `{ defined: false, reason }`.
 *
 * @example
 * ordinaryLeastSquaresLine([0, 1, 2, 3, 4], [1, 2, 4, 3, 6]);
 * // { defined: true, n: 5, intercept: { value: 1, uncertainty: 0.7348 },
 * //   slope: { value: 1.1, uncertainty: 0.3 }, covarianceInterceptSlope: -0.18,
 * //   residualSumOfSquares: 2.7, residualStandardError: 0.9487, rSquared: 0.8176,
 * //   adjustedRSquared: 0.7568 }
 */
export function ordinaryLeastSquaresLine(
  x: readonly number[],
  y: readonly number[],
): LineFit | { defined: false; reason: string } {
  if (x.length !== y.length) {
    throw new DomainError('invalid_input', `x and y differ in length (${x.length} and ${y.length})`, [
      { field: 'y', message: `expected ${x.length} values, got ${y.length}` },
    ]);
  }
  x.forEach((v, i) => requireNumber(`x[${i}]`, v));
  y.forEach((v, i) => requireNumber(`y[${i}]`, v));
  const n = x.length;
  if (n < 3) return { defined: false, reason: `a line with standard errors needs at least 3 points, got ${n}` };
  const meanX = x.reduce((s, v) => s + v, 0) / n;
  const meanY = y.reduce((s, v) => s + v, 0) / n;
  let sxx = 0;
  let sxy = 0;
  let syy = 0;
  for (let i = 0; i < n; i++) {
    const dx = x[i]! - meanX;
    const dy = y[i]! - meanY;
    sxx += dx * dx;
    sxy += dx * dy;
    syy += dy * dy;
  }
  if (sxx === 0) return { defined: false, reason: 'all x values are equal, so no slope can be fitted' };
  const b = sxy / sxx;
  const a = meanY - b * meanX;
  let rss = 0;
  for (let i = 0; i < n; i++) rss += (y[i]! - a - b * x[i]!) ** 2;
  const residualVariance = rss / (n - 2);
  // Equal y values leave syy at rounding noise rather than zero, hence the exact test.
  const rSquared = y.every((v) => v === y[0]) ? null : Math.max(0, 1 - rss / syy);
  return {
    defined: true,
    n,
    intercept: { value: a, uncertainty: Math.sqrt(residualVariance * (1 / n + (meanX * meanX) / sxx)) },
    slope: { value: b, uncertainty: Math.sqrt(residualVariance / sxx) },
    covarianceInterceptSlope: (-meanX * residualVariance) / sxx,
    residualSumOfSquares: rss,
    residualStandardError: Math.sqrt(residualVariance),
    rSquared,
    adjustedRSquared: rSquared === null ? null : 1 - ((1 - rSquared) * (n - 1)) / (n - 2),
  };
}
