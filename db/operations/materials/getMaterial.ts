import { and, eq } from 'drizzle-orm';
import { DomainError } from '../../../src/errors/DomainError.ts';
import type { Db } from '../../Db.ts';
import { materials } from '../../schema/index.ts';
import type { Actor } from '../Actor.ts';

export async function getMaterial(db: Db, actor: Actor, id: string) {
  const [row] = await db.select().from(materials).where(and(eq(materials.id, id), eq(materials.labId, actor.labId)));
  if (!row) throw new DomainError('not_found', `No material ${id} in this lab.`);
  return row;
}
