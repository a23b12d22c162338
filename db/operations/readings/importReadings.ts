import { createHash } from 'node:crypto';
import { and, eq } from 'drizzle-orm';
import { DomainError } from '../../../src/errors/DomainError.ts';
import type { Db } from '../../Db.ts';
import { readingImports } from '../../schema/index.ts';
import type { Actor } from '../Actor.ts';
import { checkAndInsertRows } from './checkAndInsertRows.ts';
import { parseReadingCsv } from './parseReadingCsv.ts';
import { parseReadingJson } from './parseReadingJson.ts';
import { readPlausibilityContexts } from './readPlausibilityContexts.ts';
import { refuseImportProblems } from './refuseImportProblems.ts';
import { resolveImportSites } from './resolveImportSites.ts';

/** Above this many rows the answer leaves the reading ids out; they are reachable by site. */
export const MAX_LISTED_READING_IDS = 1000;

export interface ImportRequest {
  format: 'csv' | 'json';
  body: Uint8Array;
  idempotencyKey?: string | undefined;
}

export interface ImportSummary {
  importId: string;
  rowCount: number;
  format: 'csv' | 'json';
  /** In file order; only on the first answer and for files of at most MAX_LISTED_READING_IDS rows. */
  readingIds?: string[];
  /** True when an Idempotency-Key matched an earlier import and nothing was written. */
  replayed: boolean;
}

async function replayed(db: Db, actor: Actor, key: string, bodySha256: string): Promise<ImportSummary | undefined> {
  const [previous] = await db.select().from(readingImports).where(and(eq(readingImports.labId, actor.labId), eq(readingImports.idempotencyKey, key)));
  if (!previous) return undefined;
  if (previous.bodySha256 !== bodySha256) {
    throw new DomainError('conflict', `Idempotency-Key "${key}" was already used for a different file (import ${previous.id}).`, [
      { field: 'header.idempotency-key', message: 'reused with a different body' },
    ]);
  }
  return { importId: previous.id, rowCount: previous.rowCount, format: previous.format as ImportSummary['format'], replayed: true };
}

/**
 * Imports a whole file of readings or none of it, in one transaction: every site is resolved in
 * one query, rows are checked and inserted chunk by chunk, and any problem anywhere refuses the
 * file with all its problems listed and rolls back what went in.
 * A repeated Idempotency-Key with the same body answers the first import again.
 *
 * @example
 * // body: "model_code,site_label,stage,observed_at,operator,wavelength_nm,method,whole_order\n
 * //        UN-07,upper notch root,before_load,2026-11-21T14:05:00Z,R. Okafor,577,whole_order,2\n"
 * await importReadings(db, actor, { format: 'csv', body });
 * // { importId: '…', rowCount: 1, format: 'csv', readingIds: ['…'], replayed: false }
 */
export async function importReadings(db: Db, actor: Actor, request: ImportRequest): Promise<ImportSummary> {
  const bodySha256 = createHash('sha256').update(request.body).digest('hex');
  return db.transaction(async (tx) => {
    if (request.idempotencyKey) {
      const earlier = await replayed(tx, actor, request.idempotencyKey, bodySha256);
      if (earlier) return earlier;
    }
    const parsed = request.format === 'csv' ? parseReadingCsv(request.body) : parseReadingJson(request.body);
    const sites = await resolveImportSites(tx, actor.labId, parsed.candidates.map((c) => c.site));
    const contexts = await readPlausibilityContexts(tx, actor.labId, [...new Set(sites.values())]);
    const [record] = await tx
      .insert(readingImports)
      .values({ labId: actor.labId, format: request.format, rowCount: parsed.candidates.length, idempotencyKey: request.idempotencyKey ?? null, bodySha256, importedByKeyId: actor.keyId })
      .returning({ id: readingImports.id });
    const outcome = await checkAndInsertRows(tx, actor, record!.id, parsed, sites, contexts);
    refuseImportProblems(outcome);
    const { readingIds } = outcome;
    return {
      importId: record!.id,
      rowCount: readingIds.length,
      format: request.format,
      ...(readingIds.length <= MAX_LISTED_READING_IDS ? { readingIds } : {}),
      replayed: false,
    };
  });
}
