import { stringify } from 'csv-stringify/sync';
import type { AnnealingPlan } from './AnnealingPlan.ts';

const formatHoursMinutes = (minutes: number): string =>
  `${Math.floor(minutes / 60)}:${String(minutes % 60).padStart(2, '0')}`;

/**
 * The plan as a CSV a technician can key into a programmable oven, one row per segment:
 * segment number, kind, target °C, rate °C/h (blank for a soak) and duration h:mm.
 * Soak minutes are rounded up so a hold is never keyed shorter than planned; ramp
 * durations follow from the rate and are rounded to the nearest minute.
 *
 * @example
 * planToSegmentTable(generateAnnealingPlan({ guidance: CAST_ACRYLIC_GUIDANCE, maxSectionThicknessMm: 6 }));
 * // 'segment,kind,target_c,rate_c_per_h,duration_h_mm\n1,ramp,80,30,1:54\n2,soak,80,,6:00\n3,ramp,49,30,1:02\n'
 */
export function planToSegmentTable(plan: Pick<AnnealingPlan, 'segments'>): string {
  const rows = plan.segments.map((s) => {
    const minutes = s.kind === 'soak' ? Math.ceil(s.durationH * 60 - 1e-6) : Math.round(s.durationH * 60);
    return [s.number, s.kind, s.endTemperatureC, s.rateCPerH ?? '', formatHoursMinutes(minutes)];
  });
  return stringify(rows, {
    header: true,
    columns: ['segment', 'kind', 'target_c', 'rate_c_per_h', 'duration_h_mm'],
  });
}
