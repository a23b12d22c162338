import { and, eq } from 'drizzle-orm';
import { DomainError } from '../../../src/errors/DomainError.ts';
import type { Db } from '../../Db.ts';
import { batches } from '../../schema/index.ts';
import type { Actor } from '../Actor.ts';

/** A batch named by its lab-unique code; an unknown code is a 404, not an empty chart. */
export async function requireBatchCode(db: Db, actor: Actor, code: string) {
  const [row] = await db.select({ id: batches.id }).from(batches).where(and(eq(batches.code, code), eq(batches.labId, actor.labId)));
  if (!row) throw new DomainError('not_found', `No batch with code "${code}" in this lab.`, [{ field: 'query.batch', message: 'unknown batch code' }]);
  return row;
}
