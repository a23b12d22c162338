import { CsvError, parse } from 'csv-parse/sync';
import { DomainError, type FieldProblem } from '../../../src/errors/DomainError.ts';
import { decodeImportText } from './decodeImportText.ts';
import type { ImportCandidate, ParsedImport } from './ParsedImport.ts';
import { readAmendmentCells } from './readAmendmentCells.ts';
import { readSiteReference } from './readSiteReference.ts';
import { KNOWN_COLUMNS, NUMERIC_COLUMNS, REQUIRED_COLUMNS } from './readingTransferColumns.ts';

const snake = (key: PropertyKey) => String(key).replace(/[A-Z]/g, (c) => `_${c.toLowerCase()}`);
const NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;
const NUMERIC: ReadonlySet<string> = new Set(NUMERIC_COLUMNS);
const METHOD_INPUTS = { whole_order: 'wholeOrder', lower_order: 'lowerOrder', analyzer_rotation_deg: 'analyzerRotationDeg', moved_fringe: 'movedFringe', srgb_hex: 'srgbHex', named_colour: 'namedColour', illuminant: 'illuminant' } as const;
const TEXT_INPUTS: ReadonlySet<string> = new Set(['moved_fringe', 'srgb_hex', 'named_colour', 'illuminant']);
const METHOD_INPUT_ENTRIES = Object.entries(METHOD_INPUTS);

/** A zod path of CreateReadingInput as the CSV names it: `reading` alone is the method column. */
function fieldOf(path: readonly PropertyKey[]): string {
  const last = path[path.length - 1];
  return path.length === 1 && last === 'reading' ? 'method' : snake(last ?? 'file');
}

function records(text: string): string[][] {
  try {
    return parse(text, { bom: true, relax_column_count: true, trim: true }) as string[][];
  } catch (error) {
    if (!(error instanceof CsvError)) throw error;
    const row = Number((error as unknown as { records?: number }).records ?? 0) + 1;
    throw new DomainError('invalid_input', `The CSV could not be read: ${error.message}. Nothing was imported.`, [{ row, field: 'file', message: error.message }]);
  }
}

function headerProblems(header: string[]): FieldProblem[] {
  const problems: FieldProblem[] = [];
  const seen = new Set<string>();
  for (const name of header) {
    if (!KNOWN_COLUMNS.has(name)) {
      const hint = name.includes(';') ? '; the columns seem separated by ";": save the sheet as comma-separated' : '';
      problems.push({ row: 1, field: name, message: `unknown column${hint}` });
    }
    if (seen.has(name)) problems.push({ row: 1, field: name, message: 'column appears twice' });
    seen.add(name);
  }
  for (const name of REQUIRED_COLUMNS) if (!seen.has(name)) problems.push({ row: 1, field: name, message: 'required column is missing' });
  if (!seen.has('site_id') && !(seen.has('model_code') && seen.has('site_label'))) {
    problems.push({ row: 1, field: 'site_label', message: 'name sites by model_code and site_label columns, or by a site_id column' });
  }
  return problems;
}

/** Numbers in cells; a comma decimal or unit text is a row problem, not a silent NaN. */
function numberCell(row: number, column: string, cell: string, problems: FieldProblem[]): number | undefined {
  if (cell === '') return undefined;
  if (NUMBER.test(cell)) return Number(cell);
  const hint = /^\d+,\d+$/.test(cell) ? ' (use a point as the decimal separator)' : '';
  problems.push({ row, field: column, message: `"${cell}" is not a number${hint}` });
  return undefined;
}

/** A row's cell by column name; the header's positions are looked up once per file. */
type CellOf = (cells: readonly string[], column: string) => string;

function cellReader(header: readonly string[]): CellOf {
  const position = new Map(header.map((name, i) => [name, i]));
  return (cells, column) => {
    const i = position.get(column);
    return i === undefined ? '' : (cells[i] ?? '');
  };
}

function candidateOf(row: number, cells: readonly string[], cellOf: CellOf, problems: FieldProblem[]): ImportCandidate {
  const text = (column: string) => cellOf(cells, column) || undefined;
  const num = (column: string) => (NUMERIC.has(column) ? numberCell(row, column, cellOf(cells, column), problems) : undefined);
  const method = text('method');
  const reading: Record<string, unknown> = { method };
  for (const [column, key] of METHOD_INPUT_ENTRIES) {
    const value = TEXT_INPUTS.has(column) ? text(column) : num(column);
    if (value !== undefined) reading[key] = value;
  }
  // fringe_order and retardation_nm are raw inputs of one method each (a white-light colour may be
  // given as a point on the scale, in nm); on other rows an export wrote the derived value
  // there, which is then checked rather than read.
  const fringeOrder = num('fringe_order');
  const retardationNm = num('retardation_nm');
  const retardationIsInput = method === 'compensator' || (method === 'white_light_colour' && reading.srgbHex === undefined && reading.namedColour === undefined);
  if (method === 'direct' && fringeOrder !== undefined) reading.fringeOrder = fringeOrder;
  if (retardationIsInput && retardationNm !== undefined) reading.retardationNm = retardationNm;
  const echo = {
    ...(method !== 'direct' && fringeOrder !== undefined ? { fringeOrder } : {}),
    ...(!retardationIsInput && retardationNm !== undefined ? { retardationNm } : {}),
  };
  const site = readSiteReference(row, { siteId: text('site_id'), modelCode: text('model_code'), siteLabel: text('site_label') }, fieldOf);
  const { problems: linkProblems, ...link } = readAmendmentCells(row, { id: text('id'), supersedesId: text('supersedes_id'), amendmentReason: text('amendment_reason') }, fieldOf);
  problems.push(...site.problems, ...linkProblems);
  const optional = (key: string, value: unknown) => (value === undefined ? {} : { [key]: value });
  return {
    row,
    site: site.site,
    echo,
    ...link,
    reading: {
      stage: text('stage'),
      ...optional('loadN', num('load_n')),
      observedAt: text('observed_at'),
      operator: text('operator'),
      wavelengthNm: num('wavelength_nm') ?? null,
      reading,
      ...optional('sign', text('sign')),
      ...optional('uncertaintyFringes', num('uncertainty_fringes')),
      ...optional('notes', text('notes')),
    },
  };
}

/**
 * Reads a lab's CSV of readings (header row of snake_case columns) into candidates for
 * validation. Problems with the header stop here; problems in cells are collected per row.
 */
export function parseReadingCsv(body: Uint8Array): ParsedImport {
  const [header, ...rows] = records(decodeImportText(body));
  if (!header || rows.length === 0) {
    throw new DomainError('invalid_input', 'The CSV has no readings. Nothing was imported.', [{ row: 1, field: 'file', message: 'a header row and at least one reading are needed' }]);
  }
  const fromHeader = headerProblems(header);
  if (fromHeader.length > 0) throw new DomainError('invalid_input', 'The CSV header is not usable. Nothing was imported.', fromHeader);
  const problems: FieldProblem[] = [];
  const candidates: ImportCandidate[] = [];
  const cellOf = cellReader(header);
  rows.forEach((cells, index) => {
    const row = index + 2;
    if (cells.every((cell) => cell === '')) return;
    if (cells.length !== header.length) {
      problems.push({ row, field: 'file', message: `the row has ${cells.length} cells, the header ${header.length}` });
      return;
    }
    candidates.push(candidateOf(row, cells, cellOf, problems));
  });
  return { format: 'csv', candidates, problems, fieldOf };
}
