import type { PlanSegment } from './AnnealingPlan.ts';

/**
 * Planned temperature at each of a sorted list of times (h since the cycle started), by linear
 * interpolation along the segments; null after the plan ends. One pass: O(samples + segments).
 *
 * @example
 * plannedTemperatures([{ kind: 'ramp', startH: 0, durationH: 2, startTemperatureC: 20, endTemperatureC: 80, ... }], [0, 1, 3]);
 * // [20, 50, null]
 */
export function plannedTemperatures(
  segments: readonly Pick<PlanSegment, 'startH' | 'durationH' | 'startTemperatureC' | 'endTemperatureC'>[],
  timesH: readonly number[],
): (number | null)[] {
  const out = new Array<number | null>(timesH.length);
  let k = 0;
  for (let i = 0; i < timesH.length; i += 1) {
    const t = timesH[i]!;
    while (k < segments.length && t > segments[k]!.startH + segments[k]!.durationH) k += 1;
    const s = segments[k];
    if (s === undefined) {
      out[i] = null;
      continue;
    }
    const f = s.durationH > 0 ? Math.max(0, (t - s.startH) / s.durationH) : 1;
    out[i] = s.startTemperatureC + f * (s.endTemperatureC - s.startTemperatureC);
  }
  return out;
}
