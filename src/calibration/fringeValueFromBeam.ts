import type { Measured } from '../uncertainty/Measured.ts';
import { calibrateAgainstFringeOrder } from './calibrateAgainstFringeOrder.ts';
import type { FringeValueCalibration } from './FringeValueCalibration.ts';

export interface BeamCalibrationInput {
  /**
   * Bending moment carried by the whole cross-section in the pure-bending span, N·mm (not
   * per unit thickness). In four-point bending with total load P and support-to-load-point
   * distance a, M = P·a/2.
   */
  bendingMomentNmm: Measured;
  /** Depth h of the beam in the plane of bending (the dimension the fringes run across), mm. */
  depthMm: Measured;
  /** Fringe order at the outer fibre. */
  fringeOrder: Measured;
  wavelengthNm: number;
}

/**
 * Beam in pure bending. The light passes through the thickness t; the beam's depth is h.
 * Outer-fibre stress σ = M·(h/2)/I with I = t·h³/12, so σ = 6M/(t·h²); at that free edge the
 * stress-optic law gives σ = N·fσ/t, hence fσ = σ·t/N = 6M/(h²·N) — t cancels when M is
 * the moment on the whole section. Units: N·mm / mm² = N/mm per fringe. GUM propagation of
 * u(M), u(h) (entering twice: exponent −2), u(N).
 *
 * @example
 * fringeValueFromBeam({ bendingMomentNmm: { value: 4000, uncertainty: 20 }, depthMm: { value: 12, uncertainty: 0.02 },
 *   fringeOrder: { value: 3.2, uncertainty: 0.02 }, wavelengthNm: 546.1 });
 * // { defined: true, fringeValueNPerMm: { value: 52.083, uncertainty: 0.4516 }, wavelengthNm: 546.1,
 * //   formula: 'pure bending, outer fibre: fσ = 6M/(h²N)' }
 */
export function fringeValueFromBeam(input: BeamCalibrationInput): FringeValueCalibration {
  return calibrateAgainstFringeOrder(
    'pure bending, outer fibre: fσ = 6M/(h²N)',
    6,
    [
      { field: 'bendingMomentNmm', measured: input.bendingMomentNmm, exponent: 1 },
      { field: 'depthMm', measured: input.depthMm, exponent: -2 },
    ],
    input.fringeOrder,
    input.wavelengthNm,
  );
}
