import { and, eq } from 'drizzle-orm';
import { DomainError } from '../../../src/errors/DomainError.ts';
import type { Db } from '../../Db.ts';
import { models } from '../../schema/index.ts';
import type { Actor } from '../Actor.ts';

export async function getModel(db: Db, actor: Actor, id: string) {
  const [row] = await db.select().from(models).where(and(eq(models.id, id), eq(models.labId, actor.labId)));
  if (!row) throw new DomainError('not_found', `No model ${id} in this lab.`);
  return row;
}
