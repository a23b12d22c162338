import { and, asc, eq, gte, lt, notExists, sql } from 'drizzle-orm';
import { alias } from 'drizzle-orm/pg-core';
import type { ReadingExportQuery } from '../../inputs/readingTransfer.ts';
import type { Db } from '../../Db.ts';
import { models, readings, sites } from '../../schema/index.ts';
import type { Actor } from '../Actor.ts';

export type ExportedReading = typeof readings.$inferSelect & { modelCode: string; siteLabel: string };

/**
 * The lab's matching readings in pages, keyset-ordered by (recorded_at, id) so each page uses
 * the lab index and memory stays at one page however large the lab is.
 *
 * @example
 * for await (const page of exportReadings(db, actor, { format: 'csv', includeSuperseded: false })) {
 *   // page: up to 2000 readings, each with modelCode 'UN-07' and siteLabel 'upper notch root'
 * }
 */
export async function* exportReadings(db: Db, actor: Actor, query: Omit<ReadingExportQuery, 'format'>, pageRows = 2000): AsyncGenerator<ExportedReading[]> {
  const successor = alias(readings, 'successor');
  let after: { at: Date; id: string } | undefined;
  for (;;) {
    const rows = await db
      .select({ reading: readings, modelCode: models.code, siteLabel: sites.label })
      .from(readings)
      .innerJoin(sites, eq(sites.id, readings.siteId))
      .innerJoin(models, eq(models.id, sites.modelId))
      .where(
        and(
          eq(readings.labId, actor.labId),
          query.siteId ? eq(readings.siteId, query.siteId) : undefined,
          query.modelId ? eq(sites.modelId, query.modelId) : undefined,
          query.stage ? eq(readings.stage, query.stage) : undefined,
          query.from ? gte(readings.observedAt, new Date(query.from)) : undefined,
          query.to ? lt(readings.observedAt, new Date(query.to)) : undefined,
          query.includeSuperseded ? undefined : notExists(db.select({ one: successor.id }).from(successor).where(eq(successor.supersedesId, readings.id))),
          after ? sql`(${readings.recordedAt}, ${readings.id}) > (${after.at.toISOString()}::timestamptz, ${after.id}::uuid)` : undefined,
        ),
      )
      .orderBy(asc(readings.recordedAt), asc(readings.id))
      .limit(pageRows);
    if (rows.length === 0) return;
    yield rows.map((r) => ({ ...r.reading, modelCode: r.modelCode, siteLabel: r.siteLabel }));
    if (rows.length < pageRows) return;
    const last = rows[rows.length - 1]!.reading;
    after = { at: last.recordedAt, id: last.id };
  }
}
