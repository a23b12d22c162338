import { asc, eq } from 'drizzle-orm';
import type { Db } from '../../Db.ts';
import { sites } from '../../schema/index.ts';
import type { Actor } from '../Actor.ts';
import { getModel } from './getModel.ts';

/** A model has a handful of sites, so they come in one list without paging. */
export async function listSites(db: Db, actor: Actor, modelId: string) {
  await getModel(db, actor, modelId);
  return db.select().from(sites).where(eq(sites.modelId, modelId)).orderBy(asc(sites.createdAt), asc(sites.id));
}
