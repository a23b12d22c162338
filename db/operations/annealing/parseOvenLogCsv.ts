import { CsvError, parse } from 'csv-parse/sync';
import { DomainError, type FieldProblem } from '../../../src/errors/DomainError.ts';

export type OvenTimeColumn = 'elapsed_h' | 'elapsed_min' | 'timestamp';

export interface ParsedOvenLog {
  timeColumn: OvenTimeColumn;
  /** Hours since the cycle started (from the first timestamp for timestamped logs), non-decreasing. */
  elapsedH: number[];
  /** Sample times when the file gave timestamps, else null. */
  observedAt: (Date | null)[];
  temperatureC: number[];
  ignoredColumns: string[];
}

const TIME_COLUMNS: readonly OvenTimeColumn[] = ['elapsed_h', 'elapsed_min', 'timestamp'];
const NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;
// An offset is required so a log's hours never depend on the zone of whoever reads it.
const INSTANT = /^\d{4}-\d{2}-\d{2}[T ]\d{2}:\d{2}(:\d{2}(\.\d+)?)?(Z|[+-]\d{2}:?\d{2})$/i;
const MAX_PROBLEMS = 50;
const MAX_SAMPLES = 500_000;

function invalid(message: string, problems: FieldProblem[]): DomainError {
  return new DomainError('invalid_input', `${message} Nothing was imported.`, problems);
}

function decode(body: Uint8Array): string {
  try {
    return new TextDecoder('utf-8', { fatal: true }).decode(body);
  } catch {
    throw invalid('The oven log is not valid UTF-8; save it as UTF-8 (or plain ASCII) CSV.', [{ row: 1, field: 'file', message: 'invalid UTF-8' }]);
  }
}

function records(text: string): string[][] {
  try {
    return parse(text, { bom: true, relax_column_count: true, trim: true, skip_empty_lines: true }) as string[][];
  } catch (error) {
    if (!(error instanceof CsvError)) throw error;
    throw invalid(`The CSV could not be read: ${error.message}.`, [{ row: Number((error as unknown as { lines?: number }).lines ?? 1), field: 'file', message: error.message }]);
  }
}

/**
 * Reads an oven controller's CSV export: a header with one time column (elapsed_h,
 * elapsed_min or timestamp with a UTC offset) and temperature_c; other columns, such as a
 * set point, are ignored and named. Rows are numbered as a spreadsheet shows them (header =
 * row 1). Every bad cell is reported (up to 50) with its row and column, and nothing is
 * returned unless every row is good.
 */
export function parseOvenLogCsv(body: Uint8Array): ParsedOvenLog {
  const [rawHeader, ...rows] = records(decode(body));
  const header = (rawHeader ?? []).map((h) => h.toLowerCase());
  const timeColumns = TIME_COLUMNS.filter((c) => header.includes(c));
  const headerProblems: FieldProblem[] = [];
  if (timeColumns.length !== 1) headerProblems.push({ row: 1, field: timeColumns[1] ?? 'elapsed_h', message: timeColumns.length === 0 ? 'a time column is needed: elapsed_h, elapsed_min or timestamp' : `give one time column, not ${timeColumns.join(' and ')}` });
  if (!header.includes('temperature_c')) headerProblems.push({ row: 1, field: 'temperature_c', message: header.some((h) => h.includes(';')) ? 'required column is missing; the columns seem separated by ";": save as comma-separated' : 'required column is missing' });
  for (const [i, name] of header.entries()) if (header.indexOf(name) !== i) headerProblems.push({ row: 1, field: name, message: 'column appears twice' });
  if (headerProblems.length > 0) throw invalid('The oven log header is not usable.', headerProblems);
  if (rows.length < 2) throw invalid('An oven log needs at least two samples.', [{ row: rows.length + 2, field: 'file', message: 'fewer than two data rows' }]);
  if (rows.length > MAX_SAMPLES) throw invalid(`An oven log holds at most ${MAX_SAMPLES} samples.`, [{ row: MAX_SAMPLES + 2, field: 'file', message: 'too many rows' }]);

  const timeColumn = timeColumns[0]!;
  const timeAt = header.indexOf(timeColumn);
  const tempAt = header.indexOf('temperature_c');
  const problems: FieldProblem[] = [];
  const problem = (p: FieldProblem) => problems.length < MAX_PROBLEMS && problems.push(p);
  const n = rows.length;
  const elapsedH = new Array<number>(n);
  const observedAt = new Array<Date | null>(n).fill(null);
  const temperatureC = new Array<number>(n);
  let originMs = Number.NaN;
  let previousH = Number.NEGATIVE_INFINITY;
  for (let i = 0; i < n; i += 1) {
    const row = i + 2;
    const cells = rows[i]!;
    if (cells.length !== header.length) problem({ row, field: 'file', message: `the row has ${cells.length} cells, the header ${header.length}` });
    const timeCell = cells[timeAt] ?? '';
    const tempCell = cells[tempAt] ?? '';
    let t = Number.NaN;
    if (timeColumn === 'timestamp') {
      const ms = INSTANT.test(timeCell) ? Date.parse(timeCell.replace(' ', 'T')) : Number.NaN;
      if (Number.isNaN(ms)) problem({ row, field: timeColumn, message: `"${timeCell}" is not an ISO 8601 time with a UTC offset (e.g. 2026-03-02T08:00:00Z)` });
      else {
        if (Number.isNaN(originMs)) originMs = ms;
        observedAt[i] = new Date(ms);
        t = (ms - originMs) / 3_600_000;
      }
    } else if (!NUMBER.test(timeCell)) {
      problem({ row, field: timeColumn, message: `"${timeCell}" is not a number${/^\d+,\d+$/.test(timeCell) ? ' (use a point as the decimal separator)' : ''}` });
    } else {
      t = Number(timeCell) / (timeColumn === 'elapsed_min' ? 60 : 1);
      if (t < 0) problem({ row, field: timeColumn, message: 'elapsed time cannot be negative' });
    }
    if (!Number.isNaN(t)) {
      if (t < previousH) problem({ row, field: timeColumn, message: 'time runs backwards here (a clock reset or two files joined?)' });
      previousH = Math.max(previousH, t);
    }
    const c = NUMBER.test(tempCell) ? Number(tempCell) : Number.NaN;
    if (Number.isNaN(c)) problem({ row, field: 'temperature_c', message: `"${tempCell}" is not a number${/^-?\d+,\d+$/.test(tempCell) ? ' (use a point as the decimal separator)' : ''}` });
    else if (c < -50 || c > 1600) problem({ row, field: 'temperature_c', message: `${c} °C is outside -50..1600 °C: a unit or typing error?` });
    elapsedH[i] = t;
    temperatureC[i] = c;
  }
  if (problems.length > 0) throw invalid(`The oven log has ${problems.length}${problems.length === MAX_PROBLEMS ? '+' : ''} bad cell(s).`, problems);
  return { timeColumn, elapsedH, observedAt, temperatureC, ignoredColumns: header.filter((h) => h !== timeColumn && h !== 'temperature_c') };
}
