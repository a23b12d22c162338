import type { CreateBatchInput } from '../../inputs/materials.ts';
import type { Db } from '../../Db.ts';
import { batches } from '../../schema/index.ts';
import type { Actor } from '../Actor.ts';
import { getMaterial } from './getMaterial.ts';

export async function createBatch(db: Db, actor: Actor, input: CreateBatchInput) {
  return db.transaction(async (tx) => {
    await getMaterial(tx, actor, input.materialId);
    const [row] = await tx
      .insert(batches)
      .values({ ...input, madeOn: input.madeOn ? new Date(input.madeOn) : null, labId: actor.labId })
      .returning();
    return row!;
  });
}
