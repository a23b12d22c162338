import { requireNumber } from '../guards/requireNumber.ts';
import { DEFAULT_COMPENSATOR_RESOLUTION_NM } from './readingDefaults.ts';
import type { MethodFringeOrder } from './ReadingMethodInput.ts';
import { resolveReadingUncertainty } from './resolveReadingUncertainty.ts';

/**
 * Compensator reading: the compensator cancels the specimen's retardation δ (nm), so
 * N = δ/λ [R: ASTM D4093]. Default uncertainty from the scale resolution r = 5 nm (common
 * practice) as a rectangular distribution, u(δ) = r/√12 [M: GUM 4.3.7], so u(N) = u(δ)/λ.
 *
 * @example
 * fringeOrderFromCompensator(288.5, 577);
 * // { fringeOrder: { value: 0.5, uncertainty: 0.0025 }, formula: 'compensator: N = δ/λ = 288.5/577 = 0.5' }
 */
export function fringeOrderFromCompensator(
  retardationNm: number,
  wavelengthNm: number,
  uncertaintyFringes?: number,
): MethodFringeOrder {
  const delta = requireNumber('retardationNm', retardationNm, { min: 0 });
  const lambda = requireNumber('wavelengthNm', wavelengthNm, { above: 0 });
  const defaultFringes = DEFAULT_COMPENSATOR_RESOLUTION_NM / Math.sqrt(12) / lambda;
  const uncertainty = resolveReadingUncertainty(uncertaintyFringes, defaultFringes);
  const value = delta / lambda;
  return { fringeOrder: { value, uncertainty }, formula: `compensator: N = δ/λ = ${delta}/${lambda} = ${value}` };
}
