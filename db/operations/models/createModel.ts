import type { CreateModelInput } from '../../inputs/models.ts';
import type { Db } from '../../Db.ts';
import { models } from '../../schema/index.ts';
import type { Actor } from '../Actor.ts';
import { getBatch } from '../materials/getBatch.ts';

export async function createModel(db: Db, actor: Actor, input: CreateModelInput) {
  return db.transaction(async (tx) => {
    await getBatch(tx, actor, input.batchId);
    const [row] = await tx.insert(models).values({ ...input, labId: actor.labId }).returning();
    return row!;
  });
}
