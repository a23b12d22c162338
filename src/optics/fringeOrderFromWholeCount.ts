import { DEFAULT_READING_UNCERTAINTY_FRINGES } from './readingDefaults.ts';
import type { MethodFringeOrder } from './ReadingMethodInput.ts';
import { requireWholeOrder } from './requireWholeOrder.ts';
import { resolveReadingUncertainty } from './resolveReadingUncertainty.ts';

/**
 * A whole fringe counted up from the zero-order (black) fringe to the point. Default
 * uncertainty ±0.1 fringe (common practice for placing a fringe centre by eye).
 *
 * @example
 * fringeOrderFromWholeCount(3);
 * // { fringeOrder: { value: 3, uncertainty: 0.1 }, formula: 'whole order counted: N = 3' }
 */
export function fringeOrderFromWholeCount(wholeOrder: number, uncertaintyFringes?: number): MethodFringeOrder {
  const n = requireWholeOrder('wholeOrder', wholeOrder);
  const uncertainty = resolveReadingUncertainty(uncertaintyFringes, DEFAULT_READING_UNCERTAINTY_FRINGES.whole_order);
  return { fringeOrder: { value: n, uncertainty }, formula: `whole order counted: N = ${n}` };
}
