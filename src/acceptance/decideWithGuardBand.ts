import { requireNumber } from '../guards/requireNumber.ts';
import { requireMeasured } from '../uncertainty/requireMeasured.ts';
import type { Measured } from '../uncertainty/Measured.ts';

export type GuardBandDecision = 'conforming' | 'not_conforming' | 'undecided';

export interface GuardBandResult {
  decision: GuardBandDecision;
  value: number;
  limit: number;
  coverageFactor: number;
  /** U = k·u. */
  expandedUncertainty: number;
  /** limit − U: values at or below it are proven to conform. */
  acceptanceZoneUpperBound: number;
  /** limit + U: values above it are proven not to conform. */
  rejectionZoneLowerBound: number;
}

/**
 * Decision against an upper specification limit with a guard band of the expanded
 * uncertainty U = k·u, in the manner of ISO 14253-1: conforming only if value + U ≤ limit,
 * not conforming only if value − U > limit, otherwise undecided (the interval straddles the
 * limit). The value is compared as given: pass a magnitude when the sign is irrelevant.
 *
 * @example
 * decideWithGuardBand({ value: 0.12, uncertainty: 0.02 }, 0.2);
 * // { decision: 'conforming', value: 0.12, limit: 0.2, coverageFactor: 2,
 * //   expandedUncertainty: 0.04, acceptanceZoneUpperBound: 0.16, rejectionZoneLowerBound: 0.24 }
 * decideWithGuardBand({ value: 0.18, uncertainty: 0.02 }, 0.2).decision; // 'undecided'
 */
export function decideWithGuardBand(measured: Measured, limit: number, coverageFactor = 2): GuardBandResult {
  const m = requireMeasured('measured', measured);
  requireNumber('limit', limit);
  const k = requireNumber('coverageFactor', coverageFactor, { above: 0 });
  const expandedUncertainty = k * m.uncertainty;
  const decision: GuardBandDecision =
    m.value + expandedUncertainty <= limit
      ? 'conforming'
      : m.value - expandedUncertainty > limit
        ? 'not_conforming'
        : 'undecided';
  return {
    decision,
    value: m.value,
    limit,
    coverageFactor: k,
    expandedUncertainty,
    acceptanceZoneUpperBound: limit - expandedUncertainty,
    rejectionZoneLowerBound: limit + expandedUncertainty,
  };
}
