import type { Measured } from '../uncertainty/Measured.ts';
import { calibrateAgainstFringeOrder } from './calibrateAgainstFringeOrder.ts';
import type { FringeValueCalibration } from './FringeValueCalibration.ts';

export interface TensionStripCalibrationInput {
  /** Axial load on the strip, N. */
  loadN: Measured;
  widthMm: Measured;
  /** Fringe order in the uniform gauge length, away from the grips. */
  fringeOrder: Measured;
  wavelengthNm: number;
}

/**
 * Strip in uniaxial tension: σ1 = P/(w·t), σ2 = 0, so N·fσ/t = P/(w·t) and fσ = P/(w·N).
 * The thickness cancels. GUM propagation of u(P), u(w), u(N).
 *
 * @example
 * fringeValueFromTensionStrip({ loadN: { value: 600, uncertainty: 3 }, widthMm: { value: 12, uncertainty: 0.02 },
 *   fringeOrder: { value: 4.6, uncertainty: 0.02 }, wavelengthNm: 577 });
 * // { defined: true, fringeValueNPerMm: { value: 10.870, uncertainty: 0.0743 }, wavelengthNm: 577,
 * //   formula: 'tension strip: fσ = P/(w·N)' }
 */
export function fringeValueFromTensionStrip(input: TensionStripCalibrationInput): FringeValueCalibration {
  return calibrateAgainstFringeOrder(
    'tension strip: fσ = P/(w·N)',
    1,
    [
      { field: 'loadN', measured: input.loadN, exponent: 1 },
      { field: 'widthMm', measured: input.widthMm, exponent: -1 },
    ],
    input.fringeOrder,
    input.wavelengthNm,
  );
}
