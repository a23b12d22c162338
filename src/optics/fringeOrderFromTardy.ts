import { requireNumber } from '../guards/requireNumber.ts';
import { DomainError } from '../errors/DomainError.ts';
import { DEFAULT_READING_UNCERTAINTY_FRINGES } from './readingDefaults.ts';
import type { MethodFringeOrder } from './ReadingMethodInput.ts';
import { requireWholeOrder } from './requireWholeOrder.ts';
import { resolveReadingUncertainty } from './resolveReadingUncertainty.ts';

/**
 * Tardy compensation: with the polarizer and quarter-wave plates set along the principal
 * directions, the analyzer is turned by β degrees until a fringe reaches the point. If fringe
 * n (the lower order) moved there, N = n + β/180; if fringe n+1 moved there, N = (n+1) − β/180.
 * Either way N lies in [n, n+1]. Default uncertainty ±0.02 fringe [M].
 *
 * @example
 * fringeOrderFromTardy(2, 45, 'lower');
 * // { fringeOrder: { value: 2.25, uncertainty: 0.02 }, formula: 'Tardy: N = n + β/180 = 2 + 45/180 = 2.25' }
 * fringeOrderFromTardy(2, 45, 'upper').fringeOrder.value; // 2.75
 */
export function fringeOrderFromTardy(
  lowerOrder: number,
  analyzerRotationDeg: number,
  movedFringe: 'lower' | 'upper',
  uncertaintyFringes?: number,
): MethodFringeOrder {
  const n = requireWholeOrder('lowerOrder', lowerOrder);
  const beta = requireNumber('analyzerRotationDeg', analyzerRotationDeg, { min: 0, max: 180 });
  const uncertainty = resolveReadingUncertainty(uncertaintyFringes, DEFAULT_READING_UNCERTAINTY_FRINGES.tardy);
  if (movedFringe === 'lower') {
    const value = n + beta / 180;
    return { fringeOrder: { value, uncertainty }, formula: `Tardy: N = n + β/180 = ${n} + ${beta}/180 = ${value}` };
  }
  if (movedFringe === 'upper') {
    const value = n + 1 - beta / 180;
    return {
      fringeOrder: { value, uncertainty },
      formula: `Tardy: N = (n + 1) − β/180 = ${n + 1} − ${beta}/180 = ${value}`,
    };
  }
  throw new DomainError('invalid_input', `movedFringe must be 'lower' or 'upper'`, [
    { field: 'movedFringe', message: `must be 'lower' or 'upper', got ${String(movedFringe)}` },
  ]);
}
