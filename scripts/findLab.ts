import { sql } from 'drizzle-orm';
import type { Db } from '../db/Db.ts';
import { rowsOf } from '../db/rowsOf.ts';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/**
 * The lab an export is for: by id, by exact name, or, with neither given, the only lab there
 * is. Anything ambiguous is refused with the labs listed, so the wrong lab is never exported.
 *
 * @example
 * await findLab(db, 'Northfield photoelastic lab'); // { id: '5b1e…', name: 'Northfield photoelastic lab' }
 */
export async function findLab(db: Db, wanted: string | undefined): Promise<{ id: string; name: string }> {
  const labs = rowsOf<{ id: string; name: string }>(await db.execute(sql`select id::text as id, name from labs order by created_at, id`));
  const matches = wanted === undefined ? labs : labs.filter((l) => (UUID.test(wanted) ? l.id === wanted.toLowerCase() : l.name === wanted));
  if (matches.length === 1) return matches[0]!;
  const list = labs.map((l) => `  ${l.id}  ${l.name}`).join('\n') || '  (none)';
  const why = wanted === undefined ? (labs.length === 0 ? 'There is no lab to export.' : 'There are several labs; choose one with --lab <id or name>.') : matches.length === 0 ? `No lab is "${wanted}".` : `Several labs are named "${wanted}"; choose one by id.`;
  throw new Error(`${why}\nLabs in this database:\n${list}`);
}
