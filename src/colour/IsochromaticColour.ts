import type { Tristimulus } from './Illuminant.ts';

/** CIELAB coordinates relative to D65 white (culori's 'lab65'). */
export interface LabD65 {
  l: number;
  a: number;
  b: number;
}

/**
 * How the colour is rendered for display: 'toLampWhite' models an eye (or a white-balanced
 * camera) adapted to the polariscope lamp, so the lamp's own white shows as sRGB white;
 * 'none' shows the light as it would look beside daylight (an incandescent lamp looks yellow).
 */
export type WhiteAdaptation = 'toLampWhite' | 'none';

export interface ColourOptions {
  adaptation?: WhiteAdaptation;
}

export interface IsochromaticColour {
  retardationNm: number;
  /** Tristimulus values under the illuminant, lamp white Y = 1. */
  xyz: Tristimulus;
  /** The colour after white adaptation, as handed to the sRGB conversion. */
  xyzD65: Tristimulus;
  /** sRGB, channels clipped to 0..1 when out of gamut. */
  srgbHex: string;
  /** CIELAB (D65) of the colour itself. */
  lab: LabD65;
  /** CIELAB (D65) of the displayed (gamut-clipped) colour: what a photograph can match. */
  displayedLab: LabD65;
  inSrgbGamut: boolean;
}
