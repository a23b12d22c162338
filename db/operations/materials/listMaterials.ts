import { and, asc, eq } from 'drizzle-orm';
import type { ListQuery } from '../../inputs/common.ts';
import type { Db } from '../../Db.ts';
import { materials } from '../../schema/index.ts';
import type { Actor } from '../Actor.ts';
import { afterCursor, toPage } from '../paging.ts';

export async function listMaterials(db: Db, actor: Actor, query: ListQuery) {
  const rows = await db
    .select()
    .from(materials)
    .where(and(eq(materials.labId, actor.labId), afterCursor(materials.createdAt, materials.id, query.cursor)))
    .orderBy(asc(materials.createdAt), asc(materials.id))
    .limit(query.limit + 1);
  return toPage(rows, query.limit, (r) => ({ at: r.createdAt, id: r.id }));
}
