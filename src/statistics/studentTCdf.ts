import { requireNumber } from '../guards/requireNumber.ts';
import { regularizedIncompleteBeta } from './regularizedIncompleteBeta.ts';

/**
 * Student t cumulative distribution function P(T ≤ t) for `degreesOfFreedom` > 0 (need not be
 * an integer, as with Welch–Satterthwaite). Uses P(|T| > |t|) = I_{ν/(ν+t²)}(ν/2, ½), so the
 * lower tail for negative t keeps full relative precision: use `2·studentTCdf(−|t|, ν)` for a
 * two-sided p-value.
 *
 * @example
 * studentTCdf(2.2281388519862766, 10); // 0.975 (the 97.5 % point of t with 10 degrees of freedom)
 * studentTCdf(1, 1);                   // 0.75  (Cauchy: ½ + atan(1)/π)
 */
export function studentTCdf(t: number, degreesOfFreedom: number): number {
  requireNumber('t', t);
  requireNumber('degreesOfFreedom', degreesOfFreedom, { above: 0 });
  const nu = degreesOfFreedom;
  const t2 = t * t;
  // Near t = 0 the argument ν/(ν + t²) rounds towards 1 and loses the digits that matter;
  // the complementary form I_{t²/(ν+t²)}(½, ν/2) keeps them.
  const bothTails =
    t2 < nu
      ? 1 - regularizedIncompleteBeta(t2 / (nu + t2), 0.5, nu / 2)
      : regularizedIncompleteBeta(nu / (nu + t2), nu / 2, 0.5);
  return t < 0 ? bothTails / 2 : 1 - bothTails / 2;
}
