import { requireNumber } from '../guards/requireNumber.ts';
import { isIndistinguishableFromZero } from '../uncertainty/isIndistinguishableFromZero.ts';
import { requireMeasured } from '../uncertainty/requireMeasured.ts';
import type { Measured } from '../uncertainty/Measured.ts';
import type { RatioOrUndefined } from './SiteStagesTypes.ts';

export interface RatioOptions {
  /** Coverage factor for "within its uncertainty of zero"; 2 unless stated. */
  coverageFactor?: number;
  /**
   * cov(numerator, denominator). Non-zero when both are built from a shared reading: for
   * (N_post − N_fab)/(N_load − N_fab) it is u(N_fab)²; for (N_pre − N_post)/N_pre it is u(N_pre)².
   */
  covariance?: number;
}

/**
 * numerator / denominator with first-order (GUM eq. 13) uncertainty
 * u(R)² = u(a)²/b² + a²u(b)²/b⁴ − 2a·cov(a,b)/b³, or `{ defined: false }` when the
 * denominator is within k·u of zero, so nothing is ever divided by noise.
 *
 * @example
 * ratioOrUndefined({ value: 0.15, uncertainty: 0.0283 }, { value: 2.1, uncertainty: 0.0283 },
 *   { covariance: 0.0004 });
 * // { defined: true, ratio: { value: 0.0714, uncertainty: 0.0130 } }
 * ratioOrUndefined({ value: 0.1, uncertainty: 0.01 }, { value: 0.03, uncertainty: 0.02 });
 * // { defined: false, reason: 'denominator 0.03 ± 0.02 is within 2·u of zero' }
 */
export function ratioOrUndefined(
  numerator: Measured,
  denominator: Measured,
  options: RatioOptions = {},
): RatioOrUndefined {
  const a = requireMeasured('numerator', numerator);
  const b = requireMeasured('denominator', denominator);
  const k = requireNumber('coverageFactor', options.coverageFactor ?? 2, { above: 0 });
  const cov = requireNumber('covariance', options.covariance ?? 0);
  if (isIndistinguishableFromZero(b, k)) {
    return {
      defined: false,
      reason: `denominator ${b.value} ± ${b.uncertainty} is within ${k}·u of zero`,
    };
  }
  const value = a.value / b.value;
  // Divide by b one factor at a time: squaring a tiny b first would underflow to 0.
  const variance =
    (a.uncertainty / b.value) ** 2 + ((value * b.uncertainty) / b.value) ** 2 - 2 * (value / b.value) * (cov / b.value);
  // With full correlation, rounding can leave the variance a hair below zero.
  const uncertainty = Math.sqrt(Math.max(0, variance));
  if (!Number.isFinite(value) || !Number.isFinite(uncertainty)) {
    return { defined: false, reason: `ratio of ${a.value} to ${b.value} is too large to represent` };
  }
  return { defined: true, ratio: { value, uncertainty } };
}
