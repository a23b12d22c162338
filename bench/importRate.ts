import { Readable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import type { Sql } from 'postgres';
import type { createApp } from '../api/createApp.ts';
import { percentileLinear } from '../src/statistics/percentileLinear.ts';
import { deriveReadingColumns } from '../db/operations/readings/deriveReadingColumns.ts';
import type { BenchReading } from './labHistory.ts';

const CSV_HEADER = 'model_code,site_label,stage,load_n,observed_at,operator,wavelength_nm,method,fringe_order\n';
const COPY_COLUMNS = 'id, lab_id, site_id, stage, load_n, observed_at, operator, wavelength_nm, method, raw_inputs, sign, fringe_order, fringe_order_uncertainty, retardation_nm, import_id, recorded_by_key_id';

/** A chunk as the lab's spreadsheet would export it: sites by model code and label. */
export function csvBody(chunk: readonly BenchReading[]): string {
  const lines = chunk.map((r) =>
    [r.site.model.code, r.site.label, r.stage, r.loadN ?? '', new Date(r.observedMs).toISOString(), r.operator, 577, 'direct', r.fringeOrder].join(','),
  );
  return CSV_HEADER + lines.join('\n') + '\n';
}

/** Who wrote a file of rows: the import record it belongs to and the key that sent it. */
export interface CopyOrigin {
  labId: string;
  importId: string;
  keyId: string;
}

/**
 * The same rows in COPY text format, the derived columns computed by the service's own function
 * beforehand and each row tied to its file's import record and key as the import ties it, so
 * both paths store identical rows (foreign keys checked alike) and the COPY figure is the
 * database's alone.
 */
export function copyBody(chunk: readonly BenchReading[], { labId, importId, keyId }: CopyOrigin): string {
  return chunk
    .map((r) => {
      const c = deriveReadingColumns({
        stage: r.stage as never,
        loadN: r.loadN ?? undefined,
        observedAt: new Date(r.observedMs).toISOString(),
        operator: r.operator,
        wavelengthNm: 577,
        reading: { method: 'direct', fringeOrder: r.fringeOrder },
        sign: 'unknown',
      });
      return [crypto.randomUUID(), labId, r.site.id, c.stage, c.loadN ?? '\\N', c.observedAt.toISOString(), c.operator, c.wavelengthNm, c.method, JSON.stringify(c.rawInputs), c.sign, c.fringeOrder, c.fringeOrderUncertainty, c.retardationNm, importId, keyId].join('\t');
    })
    .join('\n') + '\n';
}

class RollBack extends Error {}

/** One file of the bench history in both forms, with the import record its COPY rows belong to. */
export interface BenchFile {
  rows: number;
  csv: string;
  copy: string;
  origin: CopyOrigin;
}

export interface ImportAgainstCopy {
  importRowsPerSecond: number;
  copyRowsPerSecond: number;
  /** Import rate over COPY rate, file by file: median and range. */
  fileRatio: { median: number; min: number; max: number };
  files: number;
}

/**
 * Raw COPY of one file's rows into readings, after its import record as the import writes, then
 * rolled back (and the dead rows vacuumed away, untimed) so the table is as before; the figure
 * is the time until the server has taken every row.
 */
async function copyOnce(sql: Sql, { copy, origin }: BenchFile): Promise<number> {
  let seconds = 0;
  const started = performance.now();
  try {
    await sql.begin(async (tx) => {
      await tx`insert into reading_imports (id, lab_id, format, row_count, imported_by_key_id) values (${origin.importId}, ${origin.labId}, 'csv', 0, ${origin.keyId})`;
      const writable = await tx.unsafe(`copy readings (${COPY_COLUMNS}) from stdin`).writable();
      await pipeline(Readable.from([copy]), writable);
      seconds = (performance.now() - started) / 1000;
      throw new RollBack();
    });
  } catch (error) {
    if (!(error instanceof RollBack)) throw error;
  }
  await sql.unsafe('vacuum readings');
  return seconds;
}

/** The file through POST /v1/readings/import in process; it stays in the table. */
async function importOnce(app: ReturnType<typeof createApp>, key: string, { csv }: BenchFile): Promise<number> {
  const started = performance.now();
  const res = await app.request('/v1/readings/import', { method: 'POST', headers: { authorization: `Bearer ${key}`, 'content-type': 'text/csv' }, body: csv });
  if (res.status !== 201) throw new Error(`import answered ${res.status}: ${(await res.text()).slice(0, 500)}`);
  await res.arrayBuffer();
  return (performance.now() - started) / 1000;
}

/**
 * Each file is COPYed (and rolled back) and imported back to back, the order alternating from
 * file to file, so both paths meet the same table size, a warm cache as often as a cold one,
 * and the same passing load on the machine; the file-by-file ratio shows how steady that is.
 */
export async function measureImportAgainstCopy(sql: Sql, app: ReturnType<typeof createApp>, key: string, files: readonly BenchFile[], onFile: (done: number) => void): Promise<ImportAgainstCopy> {
  let copySeconds = 0;
  let importSeconds = 0;
  let rows = 0;
  const ratios: number[] = [];
  for (const [i, file] of files.entries()) {
    let copy: number;
    let imported: number;
    if (i % 2 === 0) {
      copy = await copyOnce(sql, file);
      imported = await importOnce(app, key, file);
    } else {
      imported = await importOnce(app, key, file);
      copy = await copyOnce(sql, file);
    }
    copySeconds += copy;
    importSeconds += imported;
    rows += file.rows;
    ratios.push(copy / imported);
    onFile(i + 1);
  }
  return { importRowsPerSecond: rows / importSeconds, copyRowsPerSecond: rows / copySeconds, fileRatio: { median: percentileLinear([...ratios].sort((x, y) => x - y), 0.5), min: Math.min(...ratios), max: Math.max(...ratios) }, files: files.length };
}
