import { sql } from 'drizzle-orm';
import { DomainError } from '../../src/errors/DomainError.ts';
import type { Db } from '../Db.ts';
import { rowsOf } from '../rowsOf.ts';
import type { ArchiveTable } from './archiveTables.ts';
import type { ArchiveStage } from './createArchiveStage.ts';

/**
 * Records keep their ids across a move, so an id already present here (the same lab imported
 * twice, or a copy of it) is refused with the part and id named, rather than left to a
 * unique-key error half-way through.
 *
 * @example
 * await refuseIdClashes(db, stage, readingsTable); // throws conflict: '… readings … 4c1e9a2b-…'
 */
export async function refuseIdClashes(db: Db, { part, stage }: ArchiveStage, table: ArchiveTable): Promise<void> {
  const match = sql.join(table.key.map((k) => sql`t.${sql.identifier(k.name)} = s.${sql.identifier(k.name)}`), sql` and `);
  const keyText = sql.join(table.key.map((k) => sql`s.${sql.identifier(k.name)}::text`), sql` || '/' || `);
  const [clash] = rowsOf<{ key: string; n: number | string }>(
    await db.execute(sql`select min(${keyText}) as key, count(*) as n from ${sql.identifier(stage)} s
      where exists (select 1 from ${sql.identifier(table.name)} t where ${match})`),
  );
  if (clash && Number(clash.n) > 0) {
    throw new DomainError('conflict', `${clash.n} record(s) of part ${part.name} already exist in this database (for example ${clash.key}); records keep their ids, so a lab can be restored only where it is not yet present.`);
  }
}
