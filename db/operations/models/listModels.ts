import { and, asc, eq } from 'drizzle-orm';
import type { ListQuery } from '../../inputs/common.ts';
import type { Db } from '../../Db.ts';
import { models } from '../../schema/index.ts';
import type { Actor } from '../Actor.ts';
import { afterCursor, toPage } from '../paging.ts';

export async function listModels(db: Db, actor: Actor, query: ListQuery & { batchId?: string | undefined }) {
  const rows = await db
    .select()
    .from(models)
    .where(
      and(
        eq(models.labId, actor.labId),
        query.batchId ? eq(models.batchId, query.batchId) : undefined,
        afterCursor(models.createdAt, models.id, query.cursor),
      ),
    )
    .orderBy(asc(models.createdAt), asc(models.id))
    .limit(query.limit + 1);
  return toPage(rows, query.limit, (r) => ({ at: r.createdAt, id: r.id }));
}
