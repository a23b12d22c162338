import { requireNumber } from '../guards/requireNumber.ts';
import { colourAtRetardation } from './colourAtRetardation.ts';
import type { IlluminantSpec } from './Illuminant.ts';
import type { ColourOptions, LabD65 } from './IsochromaticColour.ts';

export interface SampledSequence {
  retardationNm: number[];
  /** CIELAB (D65) of the displayed colour at each retardation. */
  displayedLab: LabD65[];
}

/**
 * The displayed isochromatic colours at δ = 0, stepNm, 2·stepNm, … up to maxRetardationNm:
 * the table a colour reading is matched against.
 *
 * @example
 * sampleIsochromaticSequence('D65', 2, 1).retardationNm; // [0, 1, 2]
 * sampleIsochromaticSequence('D65', 2, 1).displayedLab[0]; // { l: 0, a: 0, b: 0 }
 */
export function sampleIsochromaticSequence(
  illuminant: IlluminantSpec,
  maxRetardationNm: number,
  stepNm: number,
  options: ColourOptions = {},
): SampledSequence {
  const maxNm = requireNumber('maxRetardationNm', maxRetardationNm, { above: 0, max: 20_000 });
  const step = requireNumber('stepNm', stepNm, { above: 0, min: maxNm / 20_000 });
  const count = Math.floor(maxNm / step + 1e-9) + 1;
  const retardationNm = Array.from({ length: count }, (_, i) => i * step);
  return {
    retardationNm,
    displayedLab: retardationNm.map((delta) => colourAtRetardation(delta, illuminant, options).displayedLab),
  };
}
