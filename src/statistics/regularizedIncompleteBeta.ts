import { DomainError } from '../errors/DomainError.ts';
import { requireNumber } from '../guards/requireNumber.ts';
import { logGamma } from './logGamma.ts';

const MAX_ITERATIONS = 100_000;
const RELATIVE_TOLERANCE = 1e-15;
const TINY = 1e-300;

// Continued fraction for I_x(a, b) (Abramowitz & Stegun 26.5.8) evaluated with the modified
// Lentz method; it converges fast only for x < (a + 1)/(a + b + 2), hence the symmetry below.
function continuedFraction(x: number, a: number, b: number): number {
  const guard = (v: number): number => (Math.abs(v) < TINY ? TINY : v);
  let c = 1;
  let d = 1 / guard(1 - ((a + b) * x) / (a + 1));
  let h = d;
  for (let m = 1; m <= MAX_ITERATIONS; m++) {
    const m2 = 2 * m;
    const even = (m * (b - m) * x) / ((a - 1 + m2) * (a + m2));
    d = 1 / guard(1 + even * d);
    c = guard(1 + even / c);
    h *= d * c;
    const odd = (-(a + m) * (a + b + m) * x) / ((a + m2) * (a + 1 + m2));
    d = 1 / guard(1 + odd * d);
    c = guard(1 + odd / c);
    const step = d * c;
    h *= step;
    if (Math.abs(step - 1) < RELATIVE_TOLERANCE) return h;
  }
  throw new DomainError('unavailable', `incomplete beta did not converge for a=${a}, b=${b}, x=${x}`);
}

/**
 * Regularized incomplete beta function I_x(a, b) = B(x; a, b) / B(a, b), for 0 ≤ x ≤ 1 and
 * a, b > 0. It is the CDF of the beta distribution and underlies the Student t CDF.
 *
 * @example
 * regularizedIncompleteBeta(0.5, 2, 3); // 0.6875000000000009  (= 11/16, from the binomial sum)
 * regularizedIncompleteBeta(0.3, 1, 1); // 0.3     (uniform distribution)
 */
export function regularizedIncompleteBeta(x: number, a: number, b: number): number {
  requireNumber('x', x, { min: 0, max: 1 });
  requireNumber('a', a, { above: 0 });
  requireNumber('b', b, { above: 0 });
  if (x === 0 || x === 1) return x;
  const logFront =
    logGamma(a + b) - logGamma(a) - logGamma(b) + a * Math.log(x) + b * Math.log1p(-x);
  if (x < (a + 1) / (a + b + 2)) {
    return (Math.exp(logFront) * continuedFraction(x, a, b)) / a;
  }
  return 1 - (Math.exp(logFront) * continuedFraction(1 - x, b, a)) / b;
}
