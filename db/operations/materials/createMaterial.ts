import type { CreateMaterialInput } from '../../inputs/materials.ts';
import type { Db } from '../../Db.ts';
import { materials } from '../../schema/index.ts';
import type { Actor } from '../Actor.ts';

export async function createMaterial(db: Db, actor: Actor, input: CreateMaterialInput) {
  const [row] = await db.insert(materials).values({ ...input, labId: actor.labId }).returning();
  return row!;
}
