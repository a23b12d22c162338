/**
 * A lamp spectrum measured by the laboratory: wavelengths strictly increasing (nm), relative
 * power non-negative (any scale). It must cover at least 400–700 nm.
 */
export interface MeasuredLampSpectrum {
  wavelengthNm: number[];
  relativePower: number[];
}

/**
 * The light in the polariscope: CIE standard illuminant D65 (daylight), CIE standard
 * illuminant A (incandescent, 2856 K), the equal-energy illuminant E, or a measured lamp.
 */
export type IlluminantSpec = 'D65' | 'A' | 'E' | MeasuredLampSpectrum;

/** Tristimulus values scaled so that the illuminant's own white has Y = 1. */
export interface Tristimulus {
  x: number;
  y: number;
  z: number;
}
