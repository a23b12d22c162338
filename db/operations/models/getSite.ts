import { and, eq } from 'drizzle-orm';
import { DomainError } from '../../../src/errors/DomainError.ts';
import type { Db } from '../../Db.ts';
import { sites } from '../../schema/index.ts';
import type { Actor } from '../Actor.ts';

export async function getSite(db: Db, actor: Actor, id: string) {
  const [row] = await db.select().from(sites).where(and(eq(sites.id, id), eq(sites.labId, actor.labId)));
  if (!row) throw new DomainError('not_found', `No site ${id} in this lab.`);
  return row;
}
