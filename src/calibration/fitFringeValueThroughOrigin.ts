import { DomainError } from '../errors/DomainError.ts';
import { requireNumber } from '../guards/requireNumber.ts';
import { VISIBLE_WAVELENGTH_RANGE_NM } from '../optics/readingDefaults.ts';
import type { Measured } from '../uncertainty/Measured.ts';

/** One load step: the fringe order read and the specimen's stress-like quantity q = fσ·N. */
export interface CalibrationPoint {
  fringeOrder: number;
  /** q in N/mm: 8P/(πD) for a disk, P/w for a tension strip, 6M/h² for a beam. */
  stressLikeNPerMm: number;
}

export interface FringeValueFit {
  fringeValueNPerMm: Measured;
  wavelengthNm: number;
  /** Standard deviation of the residuals of q about the line, N/mm. */
  residualStandardDeviationNPerMm: number;
  /** n − 1: apply a Student t factor with this many degrees of freedom for an expanded interval. */
  degreesOfFreedom: number;
  pointCount: number;
}

/** Fewest load steps accepted: with three, two residual degrees of freedom remain to judge linearity. */
const MINIMUM_CALIBRATION_POINTS = 3;

/**
 * Least squares through the origin of q against N over several load steps (q = fσ·N, a
 * straight line through zero by the stress-optic law): fσ = ΣNq/ΣN², s² = Σ(q − fσN)²/(n − 1),
 * u(fσ) = s/√ΣN². The fringe orders are taken as the exact regressor; their reading error shows
 * up in the residuals. Needs at least 3 points and at least 2 distinct non-zero orders.
 *
 * @example
 * fitFringeValueThroughOrigin([
 *   { fringeOrder: 1, stressLikeNPerMm: 7.2 },
 *   { fringeOrder: 2, stressLikeNPerMm: 13.8 },
 *   { fringeOrder: 3, stressLikeNPerMm: 21.3 },
 *   { fringeOrder: 4, stressLikeNPerMm: 27.9 },
 * ], 577);
 * // { fringeValueNPerMm: { value: 7.01, uncertainty: 0.04435 }, wavelengthNm: 577,
 * //   residualStandardDeviationNPerMm: 0.24290, degreesOfFreedom: 3, pointCount: 4 }
 */
export function fitFringeValueThroughOrigin(points: readonly CalibrationPoint[], wavelengthNm: number): FringeValueFit {
  const lambda = requireNumber('wavelengthNm', wavelengthNm, VISIBLE_WAVELENGTH_RANGE_NM);
  if (!Array.isArray(points) || points.length < MINIMUM_CALIBRATION_POINTS) {
    throw new DomainError('invalid_input', `a calibration fit needs at least ${MINIMUM_CALIBRATION_POINTS} points`, [
      { field: 'points', message: `got ${Array.isArray(points) ? points.length : 'no list'}, need ${MINIMUM_CALIBRATION_POINTS}` },
    ]);
  }
  const xs = points.map((p, i) => requireNumber(`points[${i}].fringeOrder`, p.fringeOrder, { min: 0 }));
  const ys = points.map((p, i) => requireNumber(`points[${i}].stressLikeNPerMm`, p.stressLikeNPerMm, { min: 0 }));
  if (new Set(xs.filter((x) => x > 0)).size < 2) {
    throw new DomainError('invalid_input', 'a calibration fit needs at least 2 distinct non-zero fringe orders', [
      { field: 'points', message: 'all load steps read the same fringe order' },
    ]);
  }
  const sxx = xs.reduce((s, x) => s + x * x, 0);
  const sxy = xs.reduce((s, x, i) => s + x * (ys[i] as number), 0);
  const slope = sxy / sxx;
  const sse = xs.reduce((s, x, i) => s + ((ys[i] as number) - slope * x) ** 2, 0);
  const degreesOfFreedom = points.length - 1;
  const residualSd = Math.sqrt(sse / degreesOfFreedom);
  return {
    fringeValueNPerMm: { value: slope, uncertainty: residualSd / Math.sqrt(sxx) },
    wavelengthNm: lambda,
    residualStandardDeviationNPerMm: residualSd,
    degreesOfFreedom,
    pointCount: points.length,
  };
}
