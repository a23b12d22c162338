import { and, eq } from 'drizzle-orm';
import { DomainError } from '../../../src/errors/DomainError.ts';
import type { Db } from '../../Db.ts';
import { batches } from '../../schema/index.ts';
import type { Actor } from '../Actor.ts';

export async function getBatch(db: Db, actor: Actor, id: string) {
  const [row] = await db.select().from(batches).where(and(eq(batches.id, id), eq(batches.labId, actor.labId)));
  if (!row) throw new DomainError('not_found', `No batch ${id} in this lab.`);
  return row;
}
