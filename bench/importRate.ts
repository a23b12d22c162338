import { Readable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import type { Sql } from 'postgres';
import type { createApp } from '../api/createApp.ts';
import { deriveReadingColumns } from '../db/operations/readings/deriveReadingColumns.ts';
import type { BenchReading } from './labHistory.ts';

const CSV_HEADER = 'model_code,site_label,stage,load_n,observed_at,operator,wavelength_nm,method,fringe_order\n';
const COPY_COLUMNS = 'id, lab_id, site_id, stage, load_n, observed_at, operator, wavelength_nm, method, raw_inputs, sign, fringe_order, fringe_order_uncertainty, retardation_nm, import_id, recorded_by_key_id';

export interface RateFigure {
  rows: number;
  seconds: number;
  rowsPerSecond: number;
}

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

const rate = (rows: number, startedMs: number): RateFigure => {
  const seconds = (performance.now() - startedMs) / 1000;
  return { rows, seconds, rowsPerSecond: rows / seconds };
};

class RollBack extends Error {}

/**
 * Raw COPY of the rows into readings, after one import record per file as the import writes,
 * then rolled back so the import below starts from the same empty table; the figure is the time
 * until the server has taken every row.
 */
export async function measureCopy(sql: Sql, origins: readonly CopyOrigin[], bodies: readonly string[], rows: number): Promise<RateFigure> {
  const started = performance.now();
  let figure: RateFigure | undefined;
  try {
    await sql.begin(async (tx) => {
      for (const { importId, labId, keyId } of origins) {
        await tx`insert into reading_imports (id, lab_id, format, row_count, imported_by_key_id) values (${importId}, ${labId}, 'csv', 0, ${keyId})`;
      }
      const writable = await tx.unsafe(`copy readings (${COPY_COLUMNS}) from stdin`).writable();
      await pipeline(Readable.from(bodies), writable);
      figure = rate(rows, started);
      throw new RollBack();
    });
  } catch (error) {
    if (!(error instanceof RollBack)) throw error;
  }
  await sql.unsafe('vacuum readings');
  return figure!;
}

/** The same rows through POST /v1/readings/import, one request per chunk, in process. */
export async function measureImport(app: ReturnType<typeof createApp>, key: string, bodies: readonly string[], rows: number): Promise<RateFigure> {
  const started = performance.now();
  for (const body of bodies) {
    const res = await app.request('/v1/readings/import', { method: 'POST', headers: { authorization: `Bearer ${key}`, 'content-type': 'text/csv' }, body });
    if (res.status !== 201) throw new Error(`import answered ${res.status}: ${(await res.text()).slice(0, 500)}`);
    await res.arrayBuffer();
  }
  return rate(rows, started);
}
