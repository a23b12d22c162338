import { requireNumber } from '../guards/requireNumber.ts';
import { requireMeasured } from '../uncertainty/requireMeasured.ts';
import type { Measured } from '../uncertainty/Measured.ts';

/**
 * Retardation δ = N·λ [R: ASTM D4093, N = δ/λ]. The wavelength is taken as exact, so
 * u(δ) = λ·u(N).
 *
 * @example
 * retardationFromFringeOrder({ value: 0.25, uncertainty: 0.02 }, 577);
 * // { retardationNm: { value: 144.25, uncertainty: 11.54 } }
 */
export function retardationFromFringeOrder(fringeOrder: Measured, wavelengthNm: number): { retardationNm: Measured } {
  const n = requireMeasured('fringeOrder', fringeOrder);
  const lambda = requireNumber('wavelengthNm', wavelengthNm, { above: 0 });
  return { retardationNm: { value: n.value * lambda, uncertainty: n.uncertainty * lambda } };
}
