import { DomainError } from '../errors/DomainError.ts';
import { requireNumber } from '../guards/requireNumber.ts';
import { logGamma } from './logGamma.ts';
import { studentTCdf } from './studentTCdf.ts';

const MAX_ITERATIONS = 300;

// P(T > t), read off the lower tail where the CDF keeps its relative precision.
const upperTail = (t: number, nu: number): number => studentTCdf(-t, nu);

function density(t: number, nu: number): number {
  const logNorm = logGamma((nu + 1) / 2) - logGamma(nu / 2) - 0.5 * Math.log(nu * Math.PI);
  return Math.exp(logNorm - ((nu + 1) / 2) * Math.log1p((t * t) / nu));
}

/**
 * Inverse of the Student t CDF: the t with P(T ≤ t) = p, for 0 < p < 1 and
 * `degreesOfFreedom` > 0. Brackets the root, then refines by Newton steps that fall back to
 * bisection whenever a step would leave the bracket, so it cannot diverge.
 *
 * @example
 * studentTQuantile(0.975, 10); // 2.2281388519862757
 * studentTQuantile(0.025, 10); // -2.228138851986277
 */
export function studentTQuantile(p: number, degreesOfFreedom: number): number {
  requireNumber('p', p, { above: 0 });
  if (!(p < 1)) {
    throw new DomainError('invalid_input', `p must be less than 1, got ${p}`, [
      { field: 'p', message: 'must be < 1' },
    ]);
  }
  const nu = requireNumber('degreesOfFreedom', degreesOfFreedom, { above: 0 });
  if (p === 0.5) return 0;
  // Solving for the smaller tail directly keeps relative precision for extreme p.
  const tail = Math.min(p, 1 - p);
  let lo = 0;
  let hi = 1;
  while (upperTail(hi, nu) > tail) {
    lo = hi;
    hi *= 2;
    if (!Number.isFinite(hi)) {
      throw new DomainError('implausible_value', `t quantile for p=${p}, ν=${nu} overflows`);
    }
  }
  let t = (lo + hi) / 2;
  for (let i = 0; i < MAX_ITERATIONS; i++) {
    const excess = upperTail(t, nu) - tail;
    if (excess === 0) break;
    if (excess > 0) lo = t;
    else hi = t;
    // The upper tail falls with t at the rate of the density.
    const newton = t + excess / density(t, nu);
    const next = newton > lo && newton < hi ? newton : (lo + hi) / 2;
    if (Math.abs(next - t) <= 1e-15 * Math.max(1, t)) {
      t = next;
      break;
    }
    t = next;
  }
  return p < 0.5 ? -t : t;
}
