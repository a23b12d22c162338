import type { Measured } from '../uncertainty/Measured.ts';

/**
 * A material fringe value from one calibration specimen, at the wavelength of the reading.
 * Undefined (not thrown) when the fringe order cannot be told from zero within 2·u(N): a
 * ratio whose denominator is all noise is no calibration.
 */
export type FringeValueCalibration =
  | { defined: true; fringeValueNPerMm: Measured; wavelengthNm: number; formula: string }
  | { defined: false; reason: string; wavelengthNm: number };
