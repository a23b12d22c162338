import { sql } from 'drizzle-orm';
import type { Db } from '../Db.ts';
import type { ArchiveTable } from './archiveTables.ts';
import type { ArchiveStage } from './createArchiveStage.ts';

/**
 * Moves a verified part from its temporary table into the real one in one INSERT … SELECT:
 * immutable tables refuse only UPDATE and DELETE, so a restore is inserts alone. Lab rows get
 * the target lab; identity values are kept and the identity sequence is moved past them, so
 * later rows still sort after the restored ones. Columns the archive lacks take their default.
 *
 * @example
 * await insertStagedPart(db, readingsStage, readingsTable, labId); // 35
 */
export async function insertStagedPart(db: Db, { part, stage }: ArchiveStage, table: ArchiveTable, labId: string): Promise<void> {
  const columns = part.columns.map((c) => sql.identifier(c));
  const target = part.scope === 'lab' ? [sql.identifier('lab_id'), ...columns] : columns;
  const values = part.scope === 'lab' ? [sql`${labId}::uuid`, ...columns] : columns;
  const keep = table.identityColumns.some((c) => part.columns.includes(c)) ? sql` overriding system value` : sql``;
  await db.execute(sql`insert into ${sql.identifier(part.table)} (${sql.join(target, sql`, `)})${keep}
    select ${sql.join(values, sql`, `)} from ${sql.identifier(stage)}`);
  for (const column of table.identityColumns.filter((c) => part.columns.includes(c))) {
    const sequence = sql`pg_get_serial_sequence(${part.table}, ${column})`;
    await db.execute(sql`select setval(${sequence}, m) from (
        select greatest(coalesce(pg_sequence_last_value(${sequence}::regclass), 0), (select coalesce(max(${sql.identifier(column)}), 0) from ${sql.identifier(part.table)})) as m
      ) x where m > 0`);
  }
}
