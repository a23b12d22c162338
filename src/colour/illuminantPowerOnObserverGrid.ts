import { DomainError } from '../errors/DomainError.ts';
import { cie1931StandardObserver5Nm } from './data/cie1931StandardObserver5Nm.ts';
import { cieD65RelativePower5Nm } from './data/cieD65RelativePower5Nm.ts';
import { illuminantARelativePower } from './illuminantARelativePower.ts';
import type { IlluminantSpec } from './Illuminant.ts';
import { resampleLampSpectrum } from './resampleLampSpectrum.ts';

const { startNm, stepNm, yBar } = cie1931StandardObserver5Nm;
const gridNm: readonly number[] = yBar.map((_, i) => startNm + i * stepNm);

/**
 * The illuminant's relative spectral power at the wavelengths of the colour-matching table
 * (380–780 nm, 5 nm): D65 from the CIE table, A from its Planckian form, E constant, a measured
 * lamp validated and linearly resampled.
 *
 * @example
 * illuminantPowerOnObserverGrid('D65')[36]; // 100 (560 nm)
 * illuminantPowerOnObserverGrid('A')[4];    // 14.708 (400 nm)
 */
export function illuminantPowerOnObserverGrid(illuminant: IlluminantSpec): number[] {
  if (illuminant === 'D65') return [...cieD65RelativePower5Nm.relativePower];
  if (illuminant === 'A') return gridNm.map(illuminantARelativePower);
  if (illuminant === 'E') return gridNm.map(() => 1);
  if (typeof illuminant === 'object' && illuminant !== null) return resampleLampSpectrum(illuminant, gridNm);
  throw new DomainError('invalid_input', `unknown illuminant ${String(illuminant)}`, [
    { field: 'illuminant', message: "must be 'D65', 'A', 'E' or { wavelengthNm[], relativePower[] }" },
  ]);
}
