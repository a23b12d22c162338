import fc from 'fast-check';
import { parse } from 'csv-parse/sync';
import { stringify } from 'csv-stringify/sync';

export interface CsvCase {
  kind: string;
  body: string | Uint8Array;
  contentType?: string;
}

const NOT_NUMBERS = ['abc', 'NaN', 'Infinity', '-Infinity', '1e999', '1,5', '12 mm', '0x1F', '5e', '--3', '½', '3..2', '１２'];
const NOT_INSTANTS = ['yesterday', '2026-13-45T00:00:00Z', '21/11/2026 14:05', '2026-11-21T14:05:00', '0'];
const BAD_BYTES: number[][] = [[0xff], [0xc0, 0xaf], [0x80], [0xe2, 0x82], [0xed, 0xa0, 0x80]];
const ISO_INSTANT = /^\d{4}-\d\d-\d\dT\d\d:\d\d/;
const isNumberCell = (cell: string) => cell.trim() !== '' && Number.isFinite(Number(cell));

/**
 * Malformed variants of a valid CSV file (one the service itself exported, so it imports as is).
 * Only changes that make any file of this kind wrong are used: text where a number was, a date
 * that is none, a number no physical quantity of the lab reaches, ragged rows, unknown or
 * repeated columns, bad bytes, a body past the limit and other media types.
 */
export function csvCases(valid: string, importLimitBytes: number): fc.Arbitrary<CsvCase>[] {
  const [header, ...rows] = parse(valid, { relaxColumnCount: false }) as string[][];
  if (!header || rows.length === 0) throw new Error('the base CSV needs a header and a row');
  const cells = rows.flatMap((row, r) => row.map((cell, c) => ({ r, c, cell })));
  const numeric = cells.filter((x) => isNumberCell(x.cell));
  const instants = cells.filter((x) => ISO_INSTANT.test(x.cell));
  const write = (h: string[], rs: string[][]) => stringify([h, ...rs]);
  const replaced = (r: number, c: number, value: string) => write(header, rows.map((row, i) => (i === r ? row.map((v, j) => (j === c ? value : v)) : row)));
  const cases: fc.Arbitrary<CsvCase>[] = [
    fc.tuple(fc.nat({ max: rows.length - 1 }), fc.string({ minLength: 1, maxLength: 6 })).map(([r, extra]) => ({ kind: 'csv: extra cell', body: write(header, rows.map((row, i) => (i === r ? [...row, extra] : row))) })),
    fc.nat({ max: rows.length - 1 }).map((r) => ({ kind: 'csv: missing cell', body: write(header, rows.map((row, i) => (i === r ? row.slice(0, -1) : row))) })),
    fc.stringMatching(/^[a-z]{3,10}$/).filter((name) => !header.includes(name)).map((name) => ({ kind: 'csv: unknown column', body: write([...header, name], rows.map((row) => [...row, 'x'])) })),
    fc.nat({ max: header.length - 1 }).map((c) => ({ kind: 'csv: repeated column', body: write([...header, header[c]!], rows.map((row) => [...row, row[c]!])) })),
    fc.tuple(fc.nat({ max: valid.length }), fc.constantFrom(...BAD_BYTES)).map(([at, bad]) => {
      const bytes = new TextEncoder().encode(valid);
      return { kind: 'csv: invalid UTF-8', body: new Uint8Array([...bytes.subarray(0, at), ...bad, ...bytes.subarray(at)]) };
    }),
    fc.integer({ min: 1, max: 4096 }).map((extra) => {
      const line = `${stringify([rows[0]!])}`;
      return { kind: 'csv: oversized', body: valid + line.repeat(Math.ceil((importLimitBytes + extra) / line.length)) };
    }),
    fc.constantFrom('text/plain', 'text/csv; charset=iso-8859-1', 'application/vnd.ms-excel', 'text/tab-separated-values', '').map((type) => ({ kind: `csv as "${type}"`, body: valid, contentType: type })),
  ];
  if (numeric.length > 0) {
    cases.push(fc.tuple(fc.constantFrom(...numeric), fc.constantFrom(...NOT_NUMBERS)).map(([x, text]) => ({ kind: `csv: "${text}" in a number cell (${header[x.c]})`, body: replaced(x.r, x.c, text) })));
    cases.push(fc.constantFrom(...numeric).map((x) => ({ kind: `csv: impossible size (${header[x.c]})`, body: replaced(x.r, x.c, String(Number(x.cell) * 1e6 + 1e9)) })));
  }
  if (instants.length > 0) {
    cases.push(fc.tuple(fc.constantFrom(...instants), fc.constantFrom(...NOT_INSTANTS)).map(([x, text]) => ({ kind: `csv: "${text}" as an instant`, body: replaced(x.r, x.c, text) })));
  }
  return cases;
}
