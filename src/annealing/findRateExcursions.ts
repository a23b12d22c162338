import type { PlanSegment } from './AnnealingPlan.ts';
import type { OvenLogFinding, OvenLogTolerances } from './OvenLogComparison.ts';
import { rollingRateCPerH } from './rollingRateCPerH.ts';

type Seg = Pick<PlanSegment, 'number' | 'startH' | 'durationH' | 'rateCPerH'>;

/**
 * Episodes where the oven's rolling rate (the least-squares slope over `rateWindowH`, so
 * sample noise does not count) exceeds the fastest planned rate of the segments the window
 * overlaps. Too-fast cooling is a fault, since the stress it leaves is frozen in; too-fast
 * heating is a remark, since the soak that follows relaxes it. Only the planned span is judged:
 * after the plan the oven is free. Linear in the number of samples (sliding sums, two pointers).
 *
 * @example
 * // 6 mm cast acrylic plan, log every 0.1 h, cooling at 60 °C/h from 7.9 h where 30 °C/h is planned:
 * findRateExcursions(timesH, temperaturesC, plan.segments, { rateWindowH: 0.5, rateToleranceCPerH: 2, rateToleranceFraction: 0.1 });
 * // [{ kind: 'rate_exceeded', severity: 'fault', atH: 7.8, untilH: 8.6,
 * //    numbers: { peakRateCPerH: -60, plannedRateCPerH: 30, allowedCPerH: 35 }, message: '...' }]
 */
export function findRateExcursions(
  timesH: readonly number[],
  temperaturesC: readonly number[],
  segments: readonly Seg[],
  tol: Pick<OvenLogTolerances, 'rateWindowH' | 'rateToleranceCPerH' | 'rateToleranceFraction'>,
): OvenLogFinding[] {
  const planEndH = segments.length === 0 ? 0 : segments[segments.length - 1]!.startH + segments[segments.length - 1]!.durationH;
  const rolling = rollingRateCPerH(timesH, temperaturesC, tol.rateWindowH);
  let k = 0;
  type Episode = { fromH: number; toH: number; peak: number; planned: number; allowed: number; cooling: boolean };
  const episodes: Episode[] = [];
  let episode: Episode | null = null;
  const close = (): void => {
    if (episode === null) return;
    const e: Episode = episode;
    episode = null;
    // Noise near the limit makes one excursion flicker in and out; windows that overlap the
    // previous excursion in the same direction belong to it.
    const previous = episodes[episodes.length - 1];
    if (previous !== undefined && previous.cooling === e.cooling && e.fromH <= previous.toH + tol.rateWindowH) {
      previous.toH = e.toH;
      if (Math.abs(e.peak) > Math.abs(previous.peak)) Object.assign(previous, { peak: e.peak, planned: e.planned, allowed: e.allowed });
    } else episodes.push(e);
  };
  for (let i = 0; i < timesH.length; i += 1) {
    const ti = timesH[i]!;
    if (ti > planEndH) break;
    const rate = rolling.rateCPerH[i];
    if (rate === null || rate === undefined) continue;
    const tj = timesH[rolling.windowStart[i]!]!;
    while (k < segments.length && segments[k]!.startH + segments[k]!.durationH < tj) k += 1;
    let planned = 0;
    for (let m = k; m < segments.length && segments[m]!.startH <= ti; m += 1) {
      planned = Math.max(planned, Math.abs(segments[m]!.rateCPerH ?? 0));
    }
    const allowed = planned * (1 + tol.rateToleranceFraction) + tol.rateToleranceCPerH;
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
  return episodes.map((e) => ({
    kind: 'rate_exceeded',
    severity: e.cooling ? 'fault' : 'remark',
    atH: e.fromH,
    untilH: e.toH,
    message: `${e.cooling ? 'Cooling' : 'Heating'} at up to ${Math.abs(e.peak).toFixed(1)} °C/h (least-squares slope over ${tol.rateWindowH} h) where the plan allows ${e.planned} °C/h, from ${e.fromH.toFixed(2)} h to ${e.toH.toFixed(2)} h.`,
    numbers: { peakRateCPerH: e.peak, plannedRateCPerH: e.planned, allowedCPerH: e.allowed },
  }));
}
