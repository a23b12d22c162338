import { clampRgb, converter, displayable, formatHex } from 'culori';
import type { Color } from 'culori';
import { bradfordAdaptToD65 } from './bradfordAdaptToD65.ts';
import type { IlluminantSpec } from './Illuminant.ts';
import { illuminantWhiteXyz } from './illuminantWhiteXyz.ts';
import type { ColourOptions, IsochromaticColour, LabD65 } from './IsochromaticColour.ts';
import { xyzAtRetardation } from './xyzAtRetardation.ts';

const toRgb = converter('rgb');
const toLab65 = converter('lab65');

const labOf = (colour: Color): LabD65 => {
  const { l, a, b } = toLab65(colour);
  return { l, a, b };
};

/**
 * Colour of the dark-field isochromatic at retardation δ in white light: tristimulus values
 * from `xyzAtRetardation`, white adaptation to the lamp (Bradford, default), then culori for
 * XYZ(D65) → sRGB and CIELAB.
 *
 * @example
 * colourAtRetardation(577, 'D65').srgbHex; // '#2f2ed1' (first-order tint of passage, violet)
 * colourAtRetardation(260, 'D65').srgbHex; // '#f6fff8' (first-order white)
 */
export function colourAtRetardation(
  retardationNm: number,
  illuminant: IlluminantSpec = 'D65',
  options: ColourOptions = {},
): IsochromaticColour {
  const xyz = xyzAtRetardation(retardationNm, illuminant);
  const xyzD65 = (options.adaptation ?? 'toLampWhite') === 'none' ? xyz : bradfordAdaptToD65(xyz, illuminantWhiteXyz(illuminant));
  const colour = { mode: 'xyz65' as const, ...xyzD65 };
  const displayed = clampRgb(toRgb(colour));
  return {
    retardationNm,
    xyz,
    xyzD65,
    srgbHex: formatHex(displayed),
    lab: labOf(colour),
    displayedLab: labOf(displayed),
    inSrgbGamut: displayable(colour),
  };
}
