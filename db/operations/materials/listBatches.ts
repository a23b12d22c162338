import { and, asc, eq } from 'drizzle-orm';
import type { ListQuery } from '../../inputs/common.ts';
import type { Db } from '../../Db.ts';
import { batches } from '../../schema/index.ts';
import type { Actor } from '../Actor.ts';
import { afterCursor, toPage } from '../paging.ts';

export async function listBatches(db: Db, actor: Actor, query: ListQuery & { materialId?: string | undefined }) {
  const rows = await db
    .select()
    .from(batches)
    .where(
      and(
        eq(batches.labId, actor.labId),
        query.materialId ? eq(batches.materialId, query.materialId) : undefined,
        afterCursor(batches.createdAt, batches.id, query.cursor),
      ),
    )
    .orderBy(asc(batches.createdAt), asc(batches.id))
    .limit(query.limit + 1);
  return toPage(rows, query.limit, (r) => ({ at: r.createdAt, id: r.id }));
}
