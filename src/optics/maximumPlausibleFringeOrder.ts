import { requireNumber } from '../guards/requireNumber.ts';
import { GENEROUS_STRESS_LIMITS_MPA } from './generousStressLimitsMPa.ts';

export interface PlausibleOrderInput {
  materialFamily: string;
  /** Thickness the light passes through at the reading's site. */
  thicknessMm: number;
  fringeValueNPerMm: number;
  fringeValueWavelengthNm: number;
  /** The reading's wavelength (577 nm for white light). */
  readingWavelengthNm: number;
}

export type PlausibleOrderLimit =
  | { defined: true; maxFringeOrder: number; stressLimitMPa: number; fringeValueNPerMm: number; reason: string }
  | { defined: false; reason: string };

/**
 * The largest fringe order a sound model could show: the stress-optic law N = (σ1 − σ2)·t/fσ
 * with the family's generous stress limit and fσ converted to the reading's wavelength in
 * proportion to λ. A larger reading is a slip (a misplaced decimal, a wrong column), not a
 * measurement. Families without a limit give `{ defined: false }`.
 *
 * @example
 * maximumPlausibleFringeOrder({ materialFamily: 'polycarbonate', thicknessMm: 6, fringeValueNPerMm: 7, fringeValueWavelengthNm: 577, readingWavelengthNm: 577 });
 * // { defined: true, maxFringeOrder: 154.29, stressLimitMPa: 180, fringeValueNPerMm: 7,
 * //   reason: 'at most 154.29 fringes: 180 MPa (a generous maximum stress for polycarbonate) × 6 mm / fσ 7 N/mm at 577 nm' }
 */
export function maximumPlausibleFringeOrder(input: PlausibleOrderInput): PlausibleOrderLimit {
  const thicknessMm = requireNumber('thicknessMm', input.thicknessMm, { above: 0 });
  const fringeValue = requireNumber('fringeValueNPerMm', input.fringeValueNPerMm, { above: 0 });
  const fromNm = requireNumber('fringeValueWavelengthNm', input.fringeValueWavelengthNm, { above: 0 });
  const toNm = requireNumber('readingWavelengthNm', input.readingWavelengthNm, { above: 0 });
  const stressLimitMPa = GENEROUS_STRESS_LIMITS_MPA[input.materialFamily];
  if (stressLimitMPa === undefined) return { defined: false, reason: `no stress limit is set for the family "${input.materialFamily}"` };
  const fringeValueNPerMm = (fringeValue * toNm) / fromNm;
  const maxFringeOrder = (stressLimitMPa * thicknessMm) / fringeValueNPerMm;
  const round = (x: number) => Math.round(x * 100) / 100;
  const family = input.materialFamily.replace(/_/g, ' ');
  return {
    defined: true,
    maxFringeOrder: round(maxFringeOrder),
    stressLimitMPa,
    fringeValueNPerMm,
    reason: `at most ${round(maxFringeOrder)} fringes: ${stressLimitMPa} MPa (a generous maximum stress for ${family}) × ${thicknessMm} mm / fσ ${round(fringeValueNPerMm)} N/mm at ${toNm} nm`,
  };
}
