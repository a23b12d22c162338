import { sql } from 'drizzle-orm';
import type { Db } from '../../db/Db.ts';
import { rowsOf } from '../../db/rowsOf.ts';

/**
 * Rows in every table of the database's public schema, found from the catalogue so a table added
 * by a new migration is counted too. The migrations journal is left out: it is not lab data.
 */
export async function countRows(db: Db): Promise<Record<string, number>> {
  const tables = rowsOf<{ name: string }>(
    await db.execute(sql`select table_name as name from information_schema.tables where table_schema = 'public' and table_type = 'BASE TABLE' order by table_name`),
  ).map((t) => t.name);
  if (tables.length === 0) return {};
  const union = tables.map((t) => `select '${t}' as name, count(*)::int as n from "${t}"`).join(' union all ');
  const counts = rowsOf<{ name: string; n: number }>(await db.execute(sql.raw(union)));
  return Object.fromEntries(counts.map((c) => [c.name, Number(c.n)]));
}
