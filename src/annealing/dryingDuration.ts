import type { DryingPreStep } from './AnnealingGuidance.ts';

/**
 * Drying time for a sheet thickness from a maker's drying table: the row for that thickness,
 * or the next thicker row between rows. Past the last row, drying time is extrapolated as
 * thickness² (moisture leaves by diffusion), and the result says so.
 *
 * @example
 * dryingDuration(POLYCARBONATE_DRYING, 6);  // { durationH: 26, extrapolated: false, note: '...' }
 * dryingDuration(POLYCARBONATE_DRYING, 10); // { durationH: 70.4, extrapolated: true, note: '...' }
 */
export function dryingDuration(
  step: DryingPreStep,
  thicknessMm: number,
): { durationH: number; extrapolated: boolean; note: string } {
  const row = step.rows.find((r) => thicknessMm <= r.thicknessMm);
  const at = `at ${step.temperatureC.value} °C`;
  if (row !== undefined) {
    return {
      durationH: row.durationH,
      extrapolated: false,
      note: `Dry ${row.durationH} h ${at} before annealing (table row ${row.thicknessMm} mm).`,
    };
  }
  const last = step.rows[step.rows.length - 1]!;
  const durationH = Math.ceil(last.durationH * (thicknessMm / last.thicknessMm) ** 2 * 10) / 10;
  return {
    durationH,
    extrapolated: true,
    note: `Dry about ${durationH} h ${at}: ${thicknessMm} mm is beyond the table (last row ${last.thicknessMm} mm), extrapolated as thickness²; confirm with the sheet maker.`,
  };
}
