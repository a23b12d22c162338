import { sql } from 'drizzle-orm';
import type { Db } from '../Db.ts';
import { rowsOf } from '../rowsOf.ts';

export interface TableColumn {
  name: string;
  /** NOT NULL with no default of any kind: a row must bring a value. */
  required: boolean;
}

/**
 * A table's columns as the database has them (not as a schema file says), so no column is
 * lost to a stale file and a restore knows which columns must come with a value.
 *
 * @example
 * (await tableColumns(db, 'labs')).map((c) => c.name); // ['id', 'name', 'created_at']
 */
export async function tableColumns(db: Db, table: string): Promise<TableColumn[]> {
  const rows = rowsOf<{ column_name: string; required: boolean }>(
    // pg_catalog rather than information_schema: the same answer, many times faster on PGlite.
    await db.execute(sql`select a.attname as column_name,
        (a.attnotnull and not a.atthasdef and a.attidentity = '' and a.attgenerated = '') as required
      from pg_attribute a join pg_class c on c.oid = a.attrelid
      where c.relname = ${table} and c.relnamespace = current_schema()::regnamespace and a.attnum > 0 and not a.attisdropped
      order by a.attnum`),
  );
  return rows.map((r) => ({ name: r.column_name, required: r.required === true || String(r.required) === 'true' }));
}
