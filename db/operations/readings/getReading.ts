import { and, eq } from 'drizzle-orm';
import { DomainError } from '../../../src/errors/DomainError.ts';
import type { Db } from '../../Db.ts';
import { readings } from '../../schema/index.ts';
import type { Actor } from '../Actor.ts';

/** A reading with the id of the reading that supersedes it, if any. */
export async function getReading(db: Db, actor: Actor, id: string) {
  const [row] = await db.select().from(readings).where(and(eq(readings.id, id), eq(readings.labId, actor.labId)));
  if (!row) throw new DomainError('not_found', `No reading ${id} in this lab.`);
  const [successor] = await db.select({ id: readings.id }).from(readings).where(eq(readings.supersedesId, id));
  return { ...row, supersededById: successor?.id ?? null };
}
