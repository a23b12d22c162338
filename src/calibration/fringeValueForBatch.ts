import { requireNumber } from '../guards/requireNumber.ts';
import { fringeValueAtWavelength } from '../optics/fringeValueAtWavelength.ts';
import { requireMeasured } from '../uncertainty/requireMeasured.ts';
import type { Measured } from '../uncertainty/Measured.ts';
import { fitFringeValueThroughOrigin } from './fitFringeValueThroughOrigin.ts';

/** One stored calibration of the batch: its fringe order and the fringe value it gave. */
export interface BatchCalibration {
  fringeOrder: number;
  fringeValueNPerMm: Measured;
  wavelengthNm: number;
}

export interface BatchFringeValue {
  fringeValueNPerMm: Measured;
  wavelengthNm: number;
  source: 'batch_calibration' | 'catalogue';
  calibrationCount: number;
  method: string;
  notes: string[];
}

/**
 * The fringe value to use for a batch at the reference wavelength. The batch's own
 * calibrations win over the catalogue: with three or more, a least-squares fit through the
 * origin of q = fσ·N against N (each N brought to the reference wavelength, q unchanged);
 * with one or two, their inverse-variance weighted mean. With none, the catalogue value and
 * its wider uncertainty.
 *
 * @example
 * fringeValueForBatch([], { fringeValueNPerMm: { value: 7.0, uncertainty: 0.5 }, wavelengthNm: 577 }, 546.1);
 * // { fringeValueNPerMm: { value: 6.6253, uncertainty: 0.4732 }, wavelengthNm: 546.1, source: 'catalogue', ... }
 */
export function fringeValueForBatch(
  calibrations: readonly BatchCalibration[],
  catalogue: { fringeValueNPerMm: Measured; wavelengthNm: number },
  referenceWavelengthNm: number,
): BatchFringeValue {
  const ref = requireNumber('referenceWavelengthNm', referenceWavelengthNm, { min: 380, max: 780 });
  const dispersion = 'converted between wavelengths in proportion to λ; dispersion of the stress-optic coefficient neglected';
  if (calibrations.length === 0) {
    const converted = fringeValueAtWavelength(catalogue.fringeValueNPerMm, catalogue.wavelengthNm, ref);
    return {
      fringeValueNPerMm: converted.fringeValueNPerMm,
      wavelengthNm: ref,
      source: 'catalogue',
      calibrationCount: 0,
      method: 'catalogue value of the material',
      notes: ['no calibration of this batch: the catalogue value carries a wider uncertainty', dispersion],
    };
  }
  const converted = calibrations.map((c, i) => {
    const f = requireMeasured(`calibrations[${i}].fringeValueNPerMm`, c.fringeValueNPerMm, { above: 0 });
    return { f: fringeValueAtWavelength(f, c.wavelengthNm, ref).fringeValueNPerMm, orderAtRef: (c.fringeOrder * c.wavelengthNm) / ref, q: f.value * c.fringeOrder };
  });
  if (converted.length >= 3) {
    const fit = fitFringeValueThroughOrigin(converted.map((c) => ({ fringeOrder: c.orderAtRef, stressLikeNPerMm: c.q })), ref);
    return {
      fringeValueNPerMm: fit.fringeValueNPerMm,
      wavelengthNm: ref,
      source: 'batch_calibration',
      calibrationCount: converted.length,
      method: 'least squares through the origin of q = fσ·N over the batch calibrations',
      notes: [dispersion],
    };
  }
  const weights = converted.map((c) => 1 / Math.max(c.f.uncertainty, 1e-9 * c.f.value) ** 2);
  const total = weights.reduce((a, b) => a + b, 0);
  const value = converted.reduce((sum, c, i) => sum + weights[i]! * c.f.value, 0) / total;
  return {
    fringeValueNPerMm: { value, uncertainty: 1 / Math.sqrt(total) },
    wavelengthNm: ref,
    source: 'batch_calibration',
    calibrationCount: converted.length,
    method: 'inverse-variance weighted mean of the batch calibrations',
    notes: [dispersion],
  };
}
