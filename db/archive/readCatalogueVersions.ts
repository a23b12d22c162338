import { sql } from 'drizzle-orm';
import type { Db } from '../Db.ts';
import { rowsOf } from '../rowsOf.ts';
import { archivePartScope } from './archivePartScope.ts';
import type { ArchiveTable } from './archiveTables.ts';
import { tableColumns } from './tableColumns.ts';
import type { PlannedPart } from './planArchiveParts.ts';

const VERSION_COLUMN = 'catalogue_version';

/**
 * The catalogue versions an archive depends on: for shared rows the lab points at, and for
 * catalogue tables without lab_id (rebuilt by each database, so not archived), the distinct
 * values of their catalogue_version column where they have one.
 *
 * @example
 * await readCatalogueVersions(db, labId, parts, tables, []);
 * // { annealing_guidance_entries: ['2026.1'] }
 */
export async function readCatalogueVersions(db: Db, labId: string, parts: PlannedPart[], tables: ArchiveTable[], catalogues: string[]): Promise<Record<string, string[]>> {
  const versions: Record<string, string[]> = {};
  const read = async (table: string, where: ReturnType<typeof sql>) => {
    const rows = rowsOf<{ v: string | null }>(
      await db.execute(sql`select distinct t.${sql.identifier(VERSION_COLUMN)} as v from ${sql.identifier(table)} t where ${where} order by 1`),
    );
    const found = rows.map((r) => r.v).filter((v): v is string => v !== null);
    if (found.length > 0) versions[table] = found;
  };
  for (const part of parts) {
    if (part.scope === 'shared' && part.columns.includes(VERSION_COLUMN)) await read(part.table, archivePartScope(part.source, 'shared', labId, tables));
  }
  for (const table of catalogues) {
    if ((await tableColumns(db, table)).some((c) => c.name === VERSION_COLUMN)) await read(table, sql`true`);
  }
  return versions;
}
