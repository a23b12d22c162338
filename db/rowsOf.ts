/**
 * `db.execute()` returns an array of rows on postgres.js and `{ rows }` on PGlite; this gives
 * the rows either way.
 */
export function rowsOf<T>(result: unknown): T[] {
  if (Array.isArray(result)) return result as T[];
  return ((result as { rows?: T[] }).rows ?? []) as T[];
}
