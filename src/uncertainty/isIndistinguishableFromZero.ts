import { requireNumber } from '../guards/requireNumber.ts';
import type { Measured } from './Measured.ts';

/**
 * True when zero lies inside value ± k·u (the expanded-uncertainty interval), i.e. the
 * measurement cannot tell the quantity from zero at coverage factor k. Used to refuse a
 * division rather than return a ratio that is all noise.
 *
 * @example
 * isIndistinguishableFromZero({ value: 0.03, uncertainty: 0.02 });    // true  (0.03 ≤ 2·0.02)
 * isIndistinguishableFromZero({ value: 0.05, uncertainty: 0.02 });    // false (0.05 > 0.04)
 * isIndistinguishableFromZero({ value: 0.05, uncertainty: 0.02 }, 3); // true  (0.05 ≤ 0.06)
 */
export function isIndistinguishableFromZero(measured: Measured, coverageFactor = 2): boolean {
  const k = requireNumber('coverageFactor', coverageFactor, { above: 0 });
  return Math.abs(measured.value) <= k * measured.uncertainty;
}
