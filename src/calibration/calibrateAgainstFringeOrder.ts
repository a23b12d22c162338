import { requireNumber } from '../guards/requireNumber.ts';
import { VISIBLE_WAVELENGTH_RANGE_NM } from '../optics/readingDefaults.ts';
import { isIndistinguishableFromZero } from '../uncertainty/isIndistinguishableFromZero.ts';
import { propagatePowerProduct } from '../uncertainty/propagatePowerProduct.ts';
import type { PowerFactor } from '../uncertainty/propagatePowerProduct.ts';
import { requireMeasured } from '../uncertainty/requireMeasured.ts';
import type { Measured } from '../uncertainty/Measured.ts';
import type { FringeValueCalibration } from './FringeValueCalibration.ts';

/**
 * Common tail of the single-specimen calibrations: fσ = c·Π xᵢ^pᵢ / N, with GUM propagation,
 * or undefined when N is within 2·u(N) of zero. Geometry and load factors must be positive.
 *
 * @example
 * calibrateAgainstFringeOrder('fσ = P/(w·N)', 1, [
 *   { field: 'loadN', measured: { value: 600, uncertainty: 3 }, exponent: 1 },
 *   { field: 'widthMm', measured: { value: 12, uncertainty: 0.02 }, exponent: -1 },
 * ], { value: 4.6, uncertainty: 0.02 }, 577);
 * // { defined: true, fringeValueNPerMm: { value: 10.870, uncertainty: 0.0743 }, wavelengthNm: 577, formula: 'fσ = P/(w·N)' }
 */
export function calibrateAgainstFringeOrder(
  formula: string,
  constant: number,
  factors: readonly PowerFactor[],
  fringeOrder: Measured,
  wavelengthNm: number,
): FringeValueCalibration {
  const lambda = requireNumber('wavelengthNm', wavelengthNm, VISIBLE_WAVELENGTH_RANGE_NM);
  const n = requireMeasured('fringeOrder', fringeOrder, { min: 0 });
  for (const f of factors) requireMeasured(f.field, f.measured, { above: 0 });
  if (isIndistinguishableFromZero(n)) {
    return {
      defined: false,
      reason: `fringe order ${n.value} ± ${n.uncertainty} cannot be told from zero at k = 2; load the specimen further`,
      wavelengthNm: lambda,
    };
  }
  const fringeValueNPerMm = propagatePowerProduct(constant, [...factors, { field: 'fringeOrder', measured: n, exponent: -1 }]);
  return { defined: true, fringeValueNPerMm, wavelengthNm: lambda, formula };
}
