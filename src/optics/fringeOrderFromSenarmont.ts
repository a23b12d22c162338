import { requireNumber } from '../guards/requireNumber.ts';
import { DEFAULT_READING_UNCERTAINTY_FRINGES } from './readingDefaults.ts';
import type { MethodFringeOrder } from './ReadingMethodInput.ts';
import { requireWholeOrder } from './requireWholeOrder.ts';
import { resolveReadingUncertainty } from './resolveReadingUncertainty.ts';

/**
 * Sénarmont compensation: a quarter-wave plate after the specimen turns the elliptical light
 * into linear light rotated by half the phase; the analyzer rotation β that restores extinction
 * gives the fractional order δ/λ = β/180 [R: ASTM C148 method B, ASTM F218], so
 * N = n + β/180 with n the whole orders counted. Default uncertainty ±0.02 fringe [M].
 *
 * @example
 * fringeOrderFromSenarmont(0, 36);
 * // { fringeOrder: { value: 0.2, uncertainty: 0.02 }, formula: 'Sénarmont: N = n + β/180 = 0 + 36/180 = 0.2' }
 */
export function fringeOrderFromSenarmont(
  wholeOrder: number,
  analyzerRotationDeg: number,
  uncertaintyFringes?: number,
): MethodFringeOrder {
  const n = requireWholeOrder('wholeOrder', wholeOrder);
  const beta = requireNumber('analyzerRotationDeg', analyzerRotationDeg, { min: 0, max: 180 });
  const uncertainty = resolveReadingUncertainty(uncertaintyFringes, DEFAULT_READING_UNCERTAINTY_FRINGES.senarmont);
  const value = n + beta / 180;
  return { fringeOrder: { value, uncertainty }, formula: `Sénarmont: N = n + β/180 = ${n} + ${beta}/180 = ${value}` };
}
