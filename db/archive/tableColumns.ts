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
    await db.execute(sql`select column_name,
        (is_nullable = 'NO' and column_default is null and is_identity = 'NO' and is_generated = 'NEVER') as required
      from information_schema.columns
      where table_schema = current_schema() and table_name = ${table} order by ordinal_position`),
  );
  return rows.map((r) => ({ name: r.column_name, required: r.required === true || String(r.required) === 'true' }));
}
