import { type AnyColumn, type SQL, and, eq, gt, or } from 'drizzle-orm';
import { DomainError } from '../../src/errors/DomainError.ts';

export interface Page<T> {
  items: T[];
  /** Pass back as `cursor` for the next page; null on the last page. */
  nextCursor: string | null;
}

interface Cursor {
  at: Date;
  id: string;
}

function decodeCursor(cursor: string): Cursor {
  const [at, id] = Buffer.from(cursor, 'base64url').toString('utf8').split('|');
  const date = new Date(at ?? '');
  if (!id || !/^[0-9a-f-]{36}$/i.test(id) || Number.isNaN(date.getTime())) {
    throw new DomainError('invalid_input', 'The cursor is not one this API issued.', [{ field: 'query.cursor', message: 'unreadable cursor' }]);
  }
  return { at: date, id };
}

/**
 * Keyset condition "after the cursor" on (timestamp, id). Timestamps are stored at millisecond
 * precision so a JavaScript Date round-trips them exactly.
 */
export function afterCursor(atColumn: AnyColumn, idColumn: AnyColumn, cursor: string | undefined): SQL | undefined {
  if (!cursor) return undefined;
  const c = decodeCursor(cursor);
  return or(gt(atColumn, c.at), and(eq(atColumn, c.at), gt(idColumn, c.id)));
}

/** Rows were fetched with limit + 1; the extra row only tells that another page exists. */
export function toPage<T>(rows: T[], limit: number, keyOf: (row: T) => Cursor): Page<T> {
  const items = rows.slice(0, limit);
  const last = items[items.length - 1];
  const nextCursor = rows.length > limit && last ? Buffer.from(`${keyOf(last).at.toISOString()}|${keyOf(last).id}`).toString('base64url') : null;
  return { items, nextCursor };
}
