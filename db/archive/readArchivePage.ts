import { type SQL, sql } from 'drizzle-orm';
import type { Db } from '../Db.ts';
import { rowsOf } from '../rowsOf.ts';
import type { ArchiveTable } from './archiveTables.ts';

export interface ArchivePage {
  lines: string[];
  /** Key values of the last row, the cursor of the next page; undefined when no row came. */
  last: unknown[] | undefined;
}

/**
 * One keyset page of a part: rows as the database's own JSON text (lab_id removed), ordered by
 * the primary key, after the given key values. jsonb text has sorted keys and shortest exact
 * numbers, so the same rows give the same bytes on either database.
 *
 * @example
 * (await readArchivePage(db, readingsTable, where, undefined, 2)).lines[0];
 * // '{"id": "0b5f…", "load_n": null, "notes": null, …}'
 */
export async function readArchivePage(db: Db, table: ArchiveTable, where: SQL, after: unknown[] | undefined, limit: number): Promise<ArchivePage> {
  const keys = table.key.map((k) => sql`t.${sql.identifier(k.name)}`);
  const keyList = sql.join(keys, sql`, `);
  const cursor = after
    ? sql` and (${keyList}) > (${sql.join(after.map((v, i) => sql`${v}::${sql.raw(table.key[i]!.sqlType)}`), sql`, `)})`
    : sql``;
  const selectKeys = sql.join(table.key.map((k, i) => sql`t.${sql.identifier(k.name)} as ${sql.identifier(`k${i}`)}`), sql`, `);
  const joinKeys = sql.join(table.key.map((k, i) => sql`t.${sql.identifier(k.name)} = page.${sql.identifier(`k${i}`)}`), sql` and `);
  // Keys first, rows after: should the planner sort instead of walking the key index, it sorts
  // only the keys and builds the JSON for one page, not for every remaining row of the lab.
  const rows = rowsOf<Record<string, unknown> & { line: string }>(
    await db.execute(sql`with page as (
        select ${selectKeys} from ${sql.identifier(table.name)} t where ${where}${cursor} order by ${keyList} limit ${limit}
      )
      select (to_jsonb(t) - 'lab_id')::text as line, page.* from page join ${sql.identifier(table.name)} t on ${joinKeys}
      order by ${sql.join(table.key.map((_, i) => sql`page.${sql.identifier(`k${i}`)}`), sql`, `)}`),
  );
  const lastRow = rows.at(-1);
  return { lines: rows.map((r) => r.line), last: lastRow && table.key.map((_, i) => lastRow[`k${i}`]) };
}
