import { requireNumber } from '../guards/requireNumber.ts';
import { DEFAULT_READING_UNCERTAINTY_FRINGES } from './readingDefaults.ts';
import type { MethodFringeOrder } from './ReadingMethodInput.ts';
import { resolveReadingUncertainty } from './resolveReadingUncertainty.ts';

/**
 * A fractional order read directly (for example by matching the isochromatic colour in
 * white light). Default uncertainty ±0.2 fringe, the upper end of colour matching by eye
 * (±0.1–0.2 [M]); pass the method's own value when it is known (e.g. ±0.05 for an
 * intensity method [R: Sarma et al., Experimental Mechanics]).
 *
 * @example
 * fringeOrderFromDirect(0.79);
 * // { fringeOrder: { value: 0.79, uncertainty: 0.2 }, formula: 'direct reading: N = 0.79' }
 * fringeOrderFromDirect(0.79, 0.05).fringeOrder.uncertainty; // 0.05
 */
export function fringeOrderFromDirect(fringeOrder: number, uncertaintyFringes?: number): MethodFringeOrder {
  const value = requireNumber('fringeOrder', fringeOrder, { min: 0 });
  const uncertainty = resolveReadingUncertainty(uncertaintyFringes, DEFAULT_READING_UNCERTAINTY_FRINGES.direct);
  return { fringeOrder: { value, uncertainty }, formula: `direct reading: N = ${value}` };
}
