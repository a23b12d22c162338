import { and, eq, sql } from 'drizzle-orm';
import { DomainError } from '../../../src/errors/DomainError.ts';
import type { Db } from '../../Db.ts';
import { preparedPerDatabase } from '../../preparedPerDatabase.ts';
import { sites } from '../../schema/index.ts';
import type { Actor } from '../Actor.ts';

// The busiest read of the bench: prepared once, since building the select cost more than running it.
const siteInLab = preparedPerDatabase((db) =>
  db.select().from(sites).where(and(eq(sites.id, sql.placeholder('id')), eq(sites.labId, sql.placeholder('labId')))).prepare('site_in_lab'),
);

export async function getSite(db: Db, actor: Actor, id: string) {
  const [row] = await siteInLab(db).execute({ id, labId: actor.labId });
  if (!row) throw new DomainError('not_found', `No site ${id} in this lab.`);
  return row;
}
