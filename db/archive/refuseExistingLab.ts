import { sql } from 'drizzle-orm';
import { DomainError } from '../../src/errors/DomainError.ts';
import type { Db } from '../Db.ts';
import { rowsOf } from '../rowsOf.ts';
import type { ArchiveOpening } from './archiveFormat.ts';

/**
 * Refuses before any row is read when the archive's lab is already in this database.
 *
 * @example
 * await refuseExistingLab(db, opening.lab); // throws conflict when lab 5b1e… is present
 */
export async function refuseExistingLab(db: Db, lab: ArchiveOpening['lab']): Promise<void> {
  const [present] = rowsOf<{ name: string }>(await db.execute(sql`select name from labs where id = ${lab.id}::uuid`));
  if (present) throw new DomainError('conflict', `Lab ${lab.id} ("${present.name}") is already in this database; a lab keeps its id when moved, so it cannot be imported twice.`);
}
