import type { PlanSegment } from './AnnealingPlan.ts';
import type { OvenLogFinding, OvenLogTolerances } from './OvenLogComparison.ts';

type Seg = Pick<PlanSegment, 'number' | 'startH' | 'durationH' | 'rateCPerH'>;

/**
 * Episodes where the oven's rolling rate (over `rateWindowH`, so sample noise does not count)
 * exceeds the fastest planned rate of the segments the window overlaps. Too-fast cooling is a
 * fault, since the stress it leaves is frozen in; too-fast heating is a remark, since the soak
 * that follows relaxes it. Only the planned span is judged: after the plan the oven is free.
 * Linear in the number of samples (two pointers).
 *
 * @example
 * findRateExcursions(timesH, temperaturesC, plan.segments, tolerances);
 * // [{ kind: 'rate_exceeded', severity: 'fault', atH: 12.5, untilH: 13.4,
 * //    numbers: { peakRateCPerH: -28.1, allowedCPerH: 16.5, plannedRateCPerH: 14 }, ... }]
 */
export function findRateExcursions(
  timesH: readonly number[],
  temperaturesC: readonly number[],
  segments: readonly Seg[],
  tol: Pick<OvenLogTolerances, 'rateWindowH' | 'rateToleranceCPerH' | 'rateToleranceFraction'>,
): OvenLogFinding[] {
  const findings: OvenLogFinding[] = [];
  const planEndH = segments.length === 0 ? 0 : segments[segments.length - 1]!.startH + segments[segments.length - 1]!.durationH;
  let j = 0;
  let k = 0;
  let episode: { fromH: number; toH: number; peak: number; planned: number; allowed: number; cooling: boolean } | null = null;
  const close = (): void => {
    if (episode === null) return;
    const e = episode;
    findings.push({
      kind: 'rate_exceeded',
      severity: e.cooling ? 'fault' : 'remark',
      atH: e.fromH,
      untilH: e.toH,
      message: `${e.cooling ? 'Cooling' : 'Heating'} at up to ${Math.abs(e.peak).toFixed(1)} °C/h (rolling over ${tol.rateWindowH} h) where the plan allows ${e.planned} °C/h, from ${e.fromH.toFixed(2)} h to ${e.toH.toFixed(2)} h.`,
      numbers: { peakRateCPerH: e.peak, plannedRateCPerH: e.planned, allowedCPerH: e.allowed },
    });
    episode = null;
  };
  for (let i = 0; i < timesH.length; i += 1) {
    const ti = timesH[i]!;
    if (ti > planEndH) break;
    while (j + 1 < i && ti - timesH[j + 1]! >= tol.rateWindowH) j += 1;
    const tj = timesH[j]!;
    if (ti - tj < tol.rateWindowH) continue;
    while (k < segments.length && segments[k]!.startH + segments[k]!.durationH < tj) k += 1;
    let planned = 0;
    for (let m = k; m < segments.length && segments[m]!.startH <= ti; m += 1) {
      planned = Math.max(planned, Math.abs(segments[m]!.rateCPerH ?? 0));
    }
    const allowed = planned * (1 + tol.rateToleranceFraction) + tol.rateToleranceCPerH;
    const rate = (temperaturesC[i]! - temperaturesC[j]!) / (ti - tj);
    const cooling = rate < 0;
    if (Math.abs(rate) <= allowed) {
      close();
      continue;
    }
    if (episode !== null && episode.cooling !== cooling) close();
    if (episode === null) episode = { fromH: tj, toH: ti, peak: rate, planned, allowed, cooling };
    else {
      episode.toH = ti;
      if (Math.abs(rate) > Math.abs(episode.peak)) Object.assign(episode, { peak: rate, planned, allowed });
    }
  }
  close();
  return findings;
}
