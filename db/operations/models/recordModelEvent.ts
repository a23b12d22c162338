import type { CreateEventInput } from '../../inputs/models.ts';
import type { Db } from '../../Db.ts';
import { modelEvents } from '../../schema/index.ts';
import type { Actor } from '../Actor.ts';
import { getModel } from './getModel.ts';

export async function recordModelEvent(db: Db, actor: Actor, modelId: string, input: CreateEventInput) {
  return db.transaction(async (tx) => {
    await getModel(tx, actor, modelId);
    const [row] = await tx
      .insert(modelEvents)
      .values({ ...input, occurredAt: new Date(input.occurredAt), modelId, labId: actor.labId, recordedByKeyId: actor.keyId })
      .returning();
    return row!;
  });
}
