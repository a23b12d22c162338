import { requireNumber } from '../guards/requireNumber.ts';
import { requireMeasured } from '../uncertainty/requireMeasured.ts';
import type { Measured } from '../uncertainty/Measured.ts';

/**
 * later − earlier for two fringe-order readings taken as independent (separate stage
 * readings), so u² = u(later)² + u(earlier)². Signs must already be resolved.
 *
 * @example
 * // permanent set N_post − N_fab
 * differenceOfOrders({ value: 0.45, uncertainty: 0.02 }, { value: 0.30, uncertainty: 0.02 });
 * // { value: 0.15, uncertainty: 0.0283 }
 */
export function differenceOfOrders(later: Measured, earlier: Measured): Measured {
  const a = requireMeasured('later', later);
  const b = requireMeasured('earlier', earlier);
  // Absurdly large inputs could overflow; fail loudly rather than hand back Infinity.
  return {
    value: requireNumber('difference', a.value - b.value),
    uncertainty: requireNumber('difference uncertainty', Math.hypot(a.uncertainty, b.uncertainty)),
  };
}
