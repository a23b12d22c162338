import { sql } from 'drizzle-orm';
import { DomainError } from '../../src/errors/DomainError.ts';
import { MATERIAL_CATALOGUE } from '../catalogue/materialCatalogue.ts';
import type { Db } from '../Db.ts';
import { rowsOf } from '../rowsOf.ts';
import type { ArchiveTable } from './archiveTables.ts';

const STARTER_NAMES = JSON.stringify(MATERIAL_CATALOGUE.map((m) => m.name));

/**
 * A lab may receive an archive only while it holds no records. The catalogue materials every
 * new lab is given do not count: they are returned so the import can replace them with the
 * archive's own (which carry the same names and would clash). Refuses (409) naming what is there.
 *
 * @example
 * await checkLabIsEmpty(db, labId, tables); // ['9d0c…', …] the starter material ids
 */
export async function checkLabIsEmpty(db: Db, labId: string, tables: ArchiveTable[]): Promise<string[]> {
  const found: string[] = [];
  let starters: string[] = [];
  for (const table of tables) {
    const T = sql.identifier(table.name);
    if (table.name === 'materials') {
      const rows = rowsOf<{ id: string; starter: boolean }>(
        await db.execute(sql`select id, name in (select jsonb_array_elements_text(${STARTER_NAMES}::jsonb)) as starter from ${T} where lab_id = ${labId}::uuid`),
      );
      starters = rows.filter((r) => r.starter).map((r) => r.id);
      if (starters.length < rows.length) found.push(`${rows.length - starters.length} materials`);
      continue;
    }
    const [row] = rowsOf<{ n: number | string }>(await db.execute(sql`select count(*) as n from ${T} where lab_id = ${labId}::uuid`));
    if (Number(row?.n ?? 0) > 0) found.push(`${row!.n} ${table.name}`);
  }
  if (found.length > 0) throw new DomainError('conflict', `An archive is imported only into a lab without records; this lab has ${found.join(', ')}. Import into a new lab (npm run lab:import) instead.`);
  return starters;
}
