import { requireNumber } from '../guards/requireNumber.ts';
import { isIndistinguishableFromZero } from '../uncertainty/isIndistinguishableFromZero.ts';
import { requireMeasured } from '../uncertainty/requireMeasured.ts';
import type { Measured } from '../uncertainty/Measured.ts';
import { differenceOfOrders } from './differenceOfOrders.ts';
import type { PermanentSetShare } from './SiteStagesTypes.ts';

export interface PermanentSetShareOptions {
  /** Both readings carry a measured sign; otherwise a fall in magnitude is ambiguous. */
  signsKnown: boolean;
  coverageFactor?: number;
}

// sign with sgn(0) = +1: at |x|'s kink either one-sided slope has magnitude 1, and using one
// keeps u(share) from collapsing to zero exactly where the share is least certain.
const MAX_SD_IN_UNIT_INTERVAL = 0.5;

const sgn = (x: number): number => (x >= 0 ? 1 : -1);

/**
 * Share of the post-test residual that the load left: S = |N_set| / (|N_fab| + |N_set|) with
 * N_set = N_post − N_fab, bounded 0..1. Uncertainty is first order in the two independent
 * readings N_fab and N_post (not in N_set, which shares N_fab): with D = |N_fab| + |N_set|,
 * ∂S/∂N_post = sgn(N_set)·|N_fab|/D² and ∂S/∂N_fab = −(sgn(N_set)|N_fab| + sgn(N_fab)|N_set|)/D².
 * Undefined when both terms are within k·u of zero.
 *
 * @example
 * permanentSetShare({ value: 0.30, uncertainty: 0.02 }, { value: 0.45, uncertainty: 0.02 },
 *   { signsKnown: true });
 * // { defined: true, share: { value: 0.3333, uncertainty: 0.0534 }, coverageFactor: 2,
 * //   possibleRelaxationOrSignReversal: false, notes: [] }
 */
export function permanentSetShare(
  fabrication: Measured,
  afterUnload: Measured,
  options: PermanentSetShareOptions,
): PermanentSetShare {
  const fab = requireMeasured('fabrication', fabrication);
  const post = requireMeasured('afterUnload', afterUnload);
  const k = requireNumber('coverageFactor', options.coverageFactor ?? 2, { above: 0 });
  const set = differenceOfOrders(post, fab);
  const possibleRelaxationOrSignReversal = !options.signsKnown && Math.abs(post.value) < Math.abs(fab.value);
  const fabNearZero = isIndistinguishableFromZero(fab, k);
  const setNearZero = isIndistinguishableFromZero(set, k);
  if (fabNearZero && setNearZero) {
    return {
      defined: false,
      reason: `N_fab (${fab.value} ± ${fab.uncertainty}) and N_set (${set.value} ± ${set.uncertainty.toPrecision(3)}) are both within ${k}·u of zero`,
      coverageFactor: k,
      possibleRelaxationOrSignReversal,
    };
  }
  const absFab = Math.abs(fab.value);
  const absSet = Math.abs(set.value);
  const d = absFab + absSet;
  // Each factor is divided by d on its own so that tiny orders do not underflow d² to zero.
  const postTerm = sgn(set.value) * (absFab / d) * (post.uncertainty / d);
  const fabTerm = -(sgn(set.value) * (absFab / d) + sgn(fab.value) * (absSet / d)) * (fab.uncertainty / d);
  const notes: string[] = [];
  if (fabNearZero) notes.push(`N_fab is within ${k}·u of zero: share near 1, first-order uncertainty only approximate`);
  if (setNearZero) notes.push(`N_set is within ${k}·u of zero: share near 0, first-order uncertainty only approximate`);
  const firstOrder = Math.hypot(postTerm, fabTerm);
  // A quantity confined to 0..1 has a standard deviation of at most 0.5 (Popoviciu's
  // inequality); a larger first-order value only says the linearisation has broken down.
  const uncertainty = Math.min(firstOrder, MAX_SD_IN_UNIT_INTERVAL);
  if (firstOrder > MAX_SD_IN_UNIT_INTERVAL) {
    notes.push(`first-order uncertainty ${firstOrder.toPrecision(3)} exceeds 0.5, the most a share in 0..1 can have: capped at 0.5`);
  }
  if (possibleRelaxationOrSignReversal) {
    notes.push('unsigned N_post below N_fab: the residual relaxed, or the load reversed its sign; the share assumes no reversal');
  }
  return {
    defined: true,
    share: { value: absSet / d, uncertainty },
    coverageFactor: k,
    possibleRelaxationOrSignReversal,
    notes,
  };
}
