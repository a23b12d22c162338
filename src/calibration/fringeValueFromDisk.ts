import type { Measured } from '../uncertainty/Measured.ts';
import { calibrateAgainstFringeOrder } from './calibrateAgainstFringeOrder.ts';
import type { FringeValueCalibration } from './FringeValueCalibration.ts';

export interface DiskCalibrationInput {
  /** Total diametral load on the disk (whole thickness), N. */
  loadN: Measured;
  diameterMm: Measured;
  /** Fringe order at the disk centre. */
  fringeOrder: Measured;
  wavelengthNm: number;
}

/**
 * Disk in diametral compression: at the centre σx = 2P/(πDt), σy = −6P/(πDt), so
 * σ1 − σ2 = 8P/(πDt) and, with the stress-optic law, fσ = 8P/(πDN). The thickness cancels.
 * GUM propagation of u(P), u(D), u(N).
 *
 * @example
 * fringeValueFromDisk({ loadN: { value: 1200, uncertainty: 6 }, diameterMm: { value: 50, uncertainty: 0.02 },
 *   fringeOrder: { value: 5.5, uncertainty: 0.02 }, wavelengthNm: 577 });
 * // { defined: true, fringeValueNPerMm: { value: 11.112, uncertainty: 0.0688 }, wavelengthNm: 577,
 * //   formula: 'disk centre: fσ = 8P/(πDN)' }
 */
export function fringeValueFromDisk(input: DiskCalibrationInput): FringeValueCalibration {
  return calibrateAgainstFringeOrder(
    'disk centre: fσ = 8P/(πDN)',
    8 / Math.PI,
    [
      { field: 'loadN', measured: input.loadN, exponent: 1 },
      { field: 'diameterMm', measured: input.diameterMm, exponent: -1 },
    ],
    input.fringeOrder,
    input.wavelengthNm,
  );
}
