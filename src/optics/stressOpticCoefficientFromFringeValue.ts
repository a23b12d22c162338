import { requireNumber } from '../guards/requireNumber.ts';
import { requireMeasured } from '../uncertainty/requireMeasured.ts';
import type { Measured } from '../uncertainty/Measured.ts';

/**
 * Stress-optic coefficient C = λ/fσ in brewsters (1 Br = 1e-12 1/Pa). With λ in nm and fσ in
 * N/mm per fringe the units fold exactly: (1e-9 m)/(1e3 N/m) = 1e-12 m²/N, so C[Br] =
 * λ[nm]/fσ[N/mm]. The wavelength is taken as exact: u(C) = C·u(fσ)/fσ.
 *
 * @example
 * stressOpticCoefficientFromFringeValue({ value: 7.0, uncertainty: 0.2 }, 577);
 * // { stressOpticCoefficientBr: { value: 82.43, uncertainty: 2.355 } }
 */
export function stressOpticCoefficientFromFringeValue(
  fringeValueNPerMm: Measured,
  wavelengthNm: number,
): { stressOpticCoefficientBr: Measured } {
  const f = requireMeasured('fringeValueNPerMm', fringeValueNPerMm, { above: 0 });
  const lambda = requireNumber('wavelengthNm', wavelengthNm, { above: 0 });
  const value = lambda / f.value;
  return { stressOpticCoefficientBr: { value, uncertainty: (value * f.uncertainty) / f.value } };
}
