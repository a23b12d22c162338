import { and, asc, eq, notExists } from 'drizzle-orm';
import { alias } from 'drizzle-orm/pg-core';
import type { Db } from '../../Db.ts';
import { readings } from '../../schema/index.ts';
import type { Actor } from '../Actor.ts';
import { getSite } from '../models/getSite.ts';
import { afterCursor, toPage } from '../paging.ts';

export interface SiteReadingQuery {
  limit: number;
  cursor?: string | undefined;
  stage?: (typeof readings.stage.enumValues)[number] | undefined;
  includeSuperseded: boolean;
}

/** Readings at a site in the order they were observed; superseded ones only on request. */
export async function listSiteReadings(db: Db, actor: Actor, siteId: string, query: SiteReadingQuery) {
  await getSite(db, actor, siteId);
  const successor = alias(readings, 'successor');
  const rows = await db
    .select()
    .from(readings)
    .where(
      and(
        eq(readings.siteId, siteId),
        query.stage ? eq(readings.stage, query.stage) : undefined,
        query.includeSuperseded
          ? undefined
          : notExists(db.select({ one: successor.id }).from(successor).where(eq(successor.supersedesId, readings.id))),
        afterCursor(readings.observedAt, readings.id, query.cursor),
      ),
    )
    .orderBy(asc(readings.observedAt), asc(readings.id))
    .limit(query.limit + 1);
  return toPage(rows, query.limit, (r) => ({ at: r.observedAt, id: r.id }));
}
