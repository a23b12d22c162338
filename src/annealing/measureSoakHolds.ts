import type { PlanSegment } from './AnnealingPlan.ts';
import type { SoakHold } from './OvenLogComparison.ts';

/**
 * For each planned soak, the longest continuous stretch of the log within ±bandC of the soak
 * temperature that overlaps the planned soak interval, so an oven that arrived late but held
 * the full time still counts. Each soak scans only its own samples and the run around them.
 *
 * @example
 * // 6 mm cast acrylic plan, a log every 0.1 h that follows it:
 * measureSoakHolds(timesH, temperaturesC, plan.segments, 2);
 * // [{ segmentNumber: 2, temperatureC: 80, plannedH: 6, heldH: 6, fromH: 1.9, toH: 7.9 }]
 */
export function measureSoakHolds(
  timesH: readonly number[],
  temperaturesC: readonly number[],
  segments: readonly PlanSegment[],
  bandC: number,
): SoakHold[] {
  const firstAtOrAfter = (t: number): number => {
    let lo = 0;
    let hi = timesH.length;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if (timesH[mid]! < t) lo = mid + 1;
      else hi = mid;
    }
    return lo;
  };
  return segments
    .filter((s) => s.kind === 'soak')
    .map((s) => {
      const endH = s.startH + s.durationH;
      const inBand = (i: number): boolean => Math.abs(temperaturesC[i]! - s.startTemperatureC) <= bandC;
      const hold: SoakHold = { segmentNumber: s.number, temperatureC: s.startTemperatureC, plannedH: s.durationH, heldH: 0, fromH: null, toH: null };
      let i = firstAtOrAfter(s.startH);
      while (i > 0 && inBand(i - 1)) i -= 1;
      let runStart = -1;
      for (; i < timesH.length; i += 1) {
        const within = inBand(i);
        if (within && runStart < 0 && timesH[i]! <= endH) runStart = i;
        const runEnds = !within || i === timesH.length - 1;
        if (runStart >= 0 && runEnds) {
          const last = within ? i : i - 1;
          const heldH = timesH[last]! - timesH[runStart]!;
          if (heldH > hold.heldH) Object.assign(hold, { heldH, fromH: timesH[runStart]!, toH: timesH[last]! });
          runStart = -1;
        }
        if (!within && timesH[i]! > endH) break;
      }
      return hold;
    });
}
