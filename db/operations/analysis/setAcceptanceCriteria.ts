import type { CreateAcceptanceCriteriaInput } from '../../inputs/analysis.ts';
import type { Db } from '../../Db.ts';
import { acceptanceCriteria } from '../../schema/index.ts';
import type { Actor } from '../Actor.ts';
import { getModel } from '../models/getModel.ts';

/** Puts new limits in force for a model or a project; the earlier ones stay as history. */
export async function setAcceptanceCriteria(db: Db, actor: Actor, input: CreateAcceptanceCriteriaInput) {
  return db.transaction(async (tx) => {
    if (input.modelId) await getModel(tx, actor, input.modelId);
    const [row] = await tx.insert(acceptanceCriteria).values({ ...input, labId: actor.labId, recordedByKeyId: actor.keyId }).returning();
    return row!;
  });
}
