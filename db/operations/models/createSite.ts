import type { CreateSiteInput } from '../../inputs/models.ts';
import type { Db } from '../../Db.ts';
import { sites } from '../../schema/index.ts';
import type { Actor } from '../Actor.ts';
import { getModel } from './getModel.ts';

export async function createSite(db: Db, actor: Actor, modelId: string, input: CreateSiteInput) {
  return db.transaction(async (tx) => {
    await getModel(tx, actor, modelId);
    const [row] = await tx.insert(sites).values({ ...input, modelId, labId: actor.labId }).returning();
    return row!;
  });
}
