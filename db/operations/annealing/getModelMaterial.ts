import { and, eq } from 'drizzle-orm';
import { DomainError } from '../../../src/errors/DomainError.ts';
import type { Db } from '../../Db.ts';
import { batches, materials, models } from '../../schema/index.ts';
import type { Actor } from '../Actor.ts';

/** A model with the material its batch is made of, which decides the annealing guidance. */
export async function getModelMaterial(db: Db, actor: Actor, modelId: string) {
  const [row] = await db
    .select({ model: models, material: materials })
    .from(models)
    .innerJoin(batches, eq(batches.id, models.batchId))
    .innerJoin(materials, eq(materials.id, batches.materialId))
    .where(and(eq(models.id, modelId), eq(models.labId, actor.labId)));
  if (!row) throw new DomainError('not_found', `No model ${modelId} in this lab.`);
  return row;
}
