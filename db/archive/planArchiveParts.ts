import { sql } from 'drizzle-orm';
import type { Db } from '../Db.ts';
import { rowsOf } from '../rowsOf.ts';
import type { ArchivePartPlan } from './archiveFormat.ts';
import { archivePartScope } from './archivePartScope.ts';
import { tableColumns } from './tableColumns.ts';
import type { ArchiveTable } from './archiveTables.ts';

export interface PlannedPart extends ArchivePartPlan {
  source: ArchiveTable;
}

/**
 * The parts of a lab's archive with their columns and row counts, in restore order; a table
 * that holds shared rows gets a ".shared" part (only the rows the lab points at) before its
 * lab part. Read inside the export's snapshot so the counts match the rows that follow.
 *
 * @example
 * (await planArchiveParts(db, labId, tables)).map((p) => p.name).slice(0, 2);
 * // ['annealing_guidance_entries.shared', 'annealing_guidance_entries']
 */
export async function planArchiveParts(db: Db, labId: string, tables: ArchiveTable[]): Promise<PlannedPart[]> {
  const parts: PlannedPart[] = [];
  for (const table of tables) {
    const columns = (await tableColumns(db, table.name)).map((c) => c.name).filter((c) => c !== 'lab_id');
    for (const scope of table.sharesRows ? (['shared', 'lab'] as const) : (['lab'] as const)) {
      const where = archivePartScope(table, scope, labId, tables);
      const [count] = rowsOf<{ n: number | string }>(await db.execute(sql`select count(*) as n from ${sql.identifier(table.name)} t where ${where}`));
      const name = scope === 'lab' ? table.name : `${table.name}.shared`;
      parts.push({ name, table: table.name, scope, columns, rows: Number(count?.n ?? 0), source: table });
    }
  }
  return parts;
}
