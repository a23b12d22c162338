import { DomainError } from '../errors/DomainError.ts';
import type { FieldProblem } from '../errors/DomainError.ts';
import type { OvenLogSample } from './OvenLogComparison.ts';

/**
 * Turns log samples into parallel arrays of elapsed hours and temperatures. All samples use
 * elapsedH, or all use timestamps (elapsed counted from the first). Time that runs backwards
 * is refused as implausible: it means a clock reset or a merged file, not an oven.
 *
 * @example
 * normaliseOvenLog([{ timestamp: '2026-03-02T08:00:00Z', temperatureC: 22 },
 *                   { timestamp: '2026-03-02T08:30:00Z', temperatureC: 31 }]);
 * // { elapsedH: [0, 0.5], temperatureC: [22, 31] }
 */
export function normaliseOvenLog(log: readonly OvenLogSample[]): { elapsedH: number[]; temperatureC: number[] } {
  if (!Array.isArray(log) || log.length < 2) {
    throw new DomainError('invalid_input', 'an oven log needs at least two samples', [{ field: 'log', message: 'fewer than two samples' }]);
  }
  const byElapsed = log[0]?.elapsedH !== undefined;
  const problems: FieldProblem[] = [];
  const elapsedH = new Array<number>(log.length);
  const temperatureC = new Array<number>(log.length);
  let originMs = 0;
  for (let i = 0; i < log.length; i += 1) {
    const s = log[i]!;
    let t: number;
    if (byElapsed) t = typeof s.elapsedH === 'number' ? s.elapsedH : Number.NaN;
    else {
      const ms = typeof s.timestamp === 'number' ? s.timestamp : typeof s.timestamp === 'string' ? Date.parse(s.timestamp) : Number.NaN;
      if (i === 0) originMs = ms;
      t = (ms - originMs) / 3_600_000;
    }
    if (!Number.isFinite(t)) problems.push({ field: byElapsed ? 'elapsedH' : 'timestamp', row: i, message: 'missing or not a valid time (use elapsedH for every sample or a timestamp for every sample)' });
    if (typeof s.temperatureC !== 'number' || !Number.isFinite(s.temperatureC)) problems.push({ field: 'temperatureC', row: i, message: 'must be a finite number' });
    if (problems.length >= 20) break;
    elapsedH[i] = t;
    temperatureC[i] = s.temperatureC;
  }
  if (problems.length > 0) throw new DomainError('invalid_input', `oven log has ${problems.length} bad sample(s)`, problems);
  for (let i = 1; i < elapsedH.length; i += 1) {
    if (elapsedH[i]! < elapsedH[i - 1]!) {
      throw new DomainError('implausible_value', `oven log time runs backwards at sample ${i}`, [
        { field: byElapsed ? 'elapsedH' : 'timestamp', row: i, message: `time ${elapsedH[i]} h is before the previous sample's ${elapsedH[i - 1]} h` },
      ]);
    }
  }
  return { elapsedH, temperatureC };
}
