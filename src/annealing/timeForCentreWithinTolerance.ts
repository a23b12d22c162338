import { requireNumber } from '../guards/requireNumber.ts';
import { slabEigenvalue } from './slabEigenvalue.ts';
import { slabOneTermCoefficient } from './slabOneTermCoefficient.ts';

export interface CentreEquilibration {
  durationH: number;
  /** Fourier number reached; 0 when the centre already lies within tolerance. */
  fourier: number;
  /**
   * False when the inverted Fo is below 0.2. The one-term form then overestimates the centre's
   * difference, so the duration is an upper bound rather than an estimate.
   */
  oneTermValid: boolean;
}

/**
 * Time for a slab's centre to come within `toleranceC` of the surroundings, from an initial
 * (uniform) difference, by inverting the one-term solution: Fo = ln(C1·ΔT0/tol)/ζ1²,
 * t = Fo·L²/α. Use biot = Infinity for a surface held at the soak temperature, or h·L/k.
 *
 * @example
 * timeForCentreWithinTolerance({
 *   initialDifferenceC: 10, toleranceC: 1, halfThicknessMm: 10, diffusivityMm2PerS: 0.144, biot: Infinity,
 * });
 * // { durationH: 0.1989, fourier: 1.0311, oneTermValid: true }
 */
export function timeForCentreWithinTolerance(input: {
  initialDifferenceC: number;
  toleranceC: number;
  halfThicknessMm: number;
  diffusivityMm2PerS: number;
  biot?: number;
}): CentreEquilibration {
  const difference = Math.abs(requireNumber('initialDifferenceC', input.initialDifferenceC));
  const tolerance = requireNumber('toleranceC', input.toleranceC, { above: 0 });
  const halfThicknessMm = requireNumber('halfThicknessMm', input.halfThicknessMm, { above: 0 });
  const alpha = requireNumber('diffusivityMm2PerS', input.diffusivityMm2PerS, { above: 0 });
  const biot = input.biot ?? Number.POSITIVE_INFINITY;
  if (difference <= tolerance) return { durationH: 0, fourier: 0, oneTermValid: true };
  const z = slabEigenvalue(biot);
  // C1 ≥ 1 and tol/ΔT0 < 1, so the logarithm is positive.
  const fourier = Math.log((slabOneTermCoefficient(biot) * difference) / tolerance) / (z * z);
  const seconds = (fourier * halfThicknessMm * halfThicknessMm) / alpha;
  return { durationH: seconds / 3600, fourier, oneTermValid: fourier > 0.2 };
}
