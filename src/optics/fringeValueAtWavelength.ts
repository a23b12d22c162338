import { requireNumber } from '../guards/requireNumber.ts';
import { requireMeasured } from '../uncertainty/requireMeasured.ts';
import type { Measured } from '../uncertainty/Measured.ts';

export interface FringeValueAtWavelength {
  fringeValueNPerMm: Measured;
  wavelengthNm: number;
  note: string;
}

/**
 * Converts a material fringe value quoted at one wavelength to another, fσ2 = fσ1·λ2/λ1,
 * since fσ = λ/C with C held fixed. Dispersion of C (a few per cent across the visible for
 * most polymers) is neglected, and the result says so. The relative uncertainty is kept.
 *
 * @example
 * fringeValueAtWavelength({ value: 7.0, uncertainty: 0.2 }, 577, 546.1);
 * // { fringeValueNPerMm: { value: 6.625, uncertainty: 0.1893 }, wavelengthNm: 546.1,
 * //   note: 'converted from 577 nm in proportion to wavelength; dispersion of the stress-optic coefficient neglected' }
 */
export function fringeValueAtWavelength(
  fringeValueNPerMm: Measured,
  fromWavelengthNm: number,
  toWavelengthNm: number,
): FringeValueAtWavelength {
  const f = requireMeasured('fringeValueNPerMm', fringeValueNPerMm, { above: 0 });
  const from = requireNumber('fromWavelengthNm', fromWavelengthNm, { above: 0 });
  const to = requireNumber('toWavelengthNm', toWavelengthNm, { above: 0 });
  const ratio = to / from;
  return {
    fringeValueNPerMm: { value: f.value * ratio, uncertainty: f.uncertainty * ratio },
    wavelengthNm: to,
    note: `converted from ${from} nm in proportion to wavelength; dispersion of the stress-optic coefficient neglected`,
  };
}
