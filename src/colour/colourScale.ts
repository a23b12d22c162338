import { DomainError } from '../errors/DomainError.ts';
import { requireNumber } from '../guards/requireNumber.ts';
import { colourAtRetardation } from './colourAtRetardation.ts';
import type { IlluminantSpec } from './Illuminant.ts';
import type { ColourOptions } from './IsochromaticColour.ts';

export interface ColourScaleStep {
  retardationNm: number;
  /** δ / 577 nm: the fringe order the usual tables quote. */
  fringeOrderAt577: number;
  hex: string;
}

const maxSteps = 20_000;

/**
 * The dark-field isochromatic colour scale from δ = 0 to maxFringes·577 nm in steps of stepNm,
 * as sRGB hex colours (see `colourAtRetardation` for the physics and rendering).
 *
 * @example
 * colourScale(1, 144.25, 'D65');
 * // [{ retardationNm: 0, fringeOrderAt577: 0, hex: '#000000' },
 * //  { retardationNm: 144.25, fringeOrderAt577: 0.25, hex: '#acc3de' }, ...,
 * //  { retardationNm: 577, fringeOrderAt577: 1, hex: '#2f2ed1' }]
 */
export function colourScale(
  maxFringes = 3,
  stepNm = 10,
  illuminant: IlluminantSpec = 'D65',
  options: ColourOptions = {},
): ColourScaleStep[] {
  const fringes = requireNumber('maxFringes', maxFringes, { above: 0, max: 20 });
  const step = requireNumber('stepNm', stepNm, { above: 0 });
  const maxNm = fringes * 577;
  const count = Math.floor(maxNm / step + 1e-9) + 1;
  if (count > maxSteps) {
    throw new DomainError('invalid_input', `colour scale would have ${count} steps`, [
      { field: 'stepNm', message: `too small for ${fringes} fringes: at most ${maxSteps} steps` },
    ]);
  }
  return Array.from({ length: count }, (_, i) => {
    const retardationNm = i * step;
    return {
      retardationNm,
      fringeOrderAt577: retardationNm / 577,
      hex: colourAtRetardation(retardationNm, illuminant, options).srgbHex,
    };
  });
}
