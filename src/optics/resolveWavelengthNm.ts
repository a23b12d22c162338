import { requireNumber } from '../guards/requireNumber.ts';
import { VISIBLE_WAVELENGTH_RANGE_NM, WHITE_LIGHT_EFFECTIVE_WAVELENGTH_NM } from './readingDefaults.ts';
import type { LightInput } from './ReadingMethodInput.ts';

/**
 * The wavelength a reading is interpreted at: the stated one (380–780 nm), or for white
 * light (`null`) the effective wavelength at the tint of passage, 577 nm [M].
 *
 * @example
 * resolveWavelengthNm({ wavelengthNm: 589.3 }); // 589.3
 * resolveWavelengthNm({ wavelengthNm: null });  // 577
 */
export function resolveWavelengthNm(light: LightInput): number {
  if (light.wavelengthNm === null) return WHITE_LIGHT_EFFECTIVE_WAVELENGTH_NM;
  return requireNumber('wavelengthNm', light.wavelengthNm, VISIBLE_WAVELENGTH_RANGE_NM);
}
