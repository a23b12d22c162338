import { and, asc, eq } from 'drizzle-orm';
import type { ListQuery } from '../../inputs/common.ts';
import type { Db } from '../../Db.ts';
import { modelEvents } from '../../schema/index.ts';
import type { Actor } from '../Actor.ts';
import { afterCursor, toPage } from '../paging.ts';
import { getModel } from './getModel.ts';

/** The fabrication history in the order things happened. */
export async function listModelEvents(db: Db, actor: Actor, modelId: string, query: ListQuery) {
  await getModel(db, actor, modelId);
  const rows = await db
    .select()
    .from(modelEvents)
    .where(and(eq(modelEvents.modelId, modelId), afterCursor(modelEvents.occurredAt, modelEvents.id, query.cursor)))
    .orderBy(asc(modelEvents.occurredAt), asc(modelEvents.id))
    .limit(query.limit + 1);
  return toPage(rows, query.limit, (r) => ({ at: r.occurredAt, id: r.id }));
}
