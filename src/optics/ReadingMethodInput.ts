import type { Measured } from '../uncertainty/Measured.ts';

/**
 * How a fringe order was read at one point. Orders are magnitudes (unsigned); the sign of a
 * residual is settled elsewhere. The API builds its request schemas from this type, so the
 * field names are part of the contract.
 */
export type ReadingMethodInput =
  | { method: 'whole_order'; wholeOrder: number } // integer fringe count at the point
  | { method: 'tardy'; lowerOrder: number; analyzerRotationDeg: number; movedFringe: 'lower' | 'upper' }
  // movedFringe 'lower': fringe n moved to the point, N = n + β/180; 'upper': fringe n+1 moved, N = (n+1) − β/180
  | { method: 'senarmont'; wholeOrder: number; analyzerRotationDeg: number } // N = n + β/180 (ASTM C148 method B, ASTM F218)
  | { method: 'compensator'; retardationNm: number } // N = δ/λ
  | { method: 'direct'; fringeOrder: number } // a fractional order read directly
  | WhiteLightColourInput;

/**
 * A white-light isochromatic colour: exactly one of an sRGB colour (photo, swatch), a trade
 * name of the sequence, or a point picked on the computed colour scale (its retardation).
 * The fields are optional in the type so untyped callers get a named error, not a crash.
 */
export interface WhiteLightColourInput {
  method: 'white_light_colour';
  srgbHex?: string;
  namedColour?: string;
  retardationNm?: number;
  /** The polariscope lamp; 'D65' when not given. */
  illuminant?: 'D65' | 'A' | 'E';
}

/** The light the reading was made in; `null` means white light (see WHITE_LIGHT_EFFECTIVE_WAVELENGTH_NM). */
export interface LightInput {
  wavelengthNm: number | null;
}

/** What one reading method yields before the dispatcher adds the retardation. */
export interface MethodFringeOrder {
  fringeOrder: Measured;
  formula: string;
}
