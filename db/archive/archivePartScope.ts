import { type SQL, sql } from 'drizzle-orm';
import type { ArchiveTable } from './archiveTables.ts';

/**
 * The WHERE condition (on alias t) that picks a part's rows: the lab's own rows, or the shared
 * rows (lab_id null) of a table that the lab's rows point at through a foreign key.
 *
 * @example
 * archivePartScope(readingsTable, 'lab', labId, tables); // sql`t.lab_id = ${labId}::uuid`
 */
export function archivePartScope(table: ArchiveTable, scope: 'lab' | 'shared', labId: string, tables: ArchiveTable[]): SQL {
  if (scope === 'lab') return sql`t.lab_id = ${labId}::uuid`;
  const pointers = tables.flatMap((from) =>
    from.references
      .filter((r) => r.table === table.name)
      .map((r) => sql`t.${sql.identifier(r.foreignColumn)} in (select r.${sql.identifier(r.column)} from ${sql.identifier(from.name)} r where r.lab_id = ${labId}::uuid)`),
  );
  if (pointers.length === 0) return sql`false`;
  return sql`t.lab_id is null and (${sql.join(pointers, sql` or `)})`;
}
