import type { PgDatabase, PgQueryResultHKT } from 'drizzle-orm/pg-core';
import type * as schema from './schema/index.ts';

/**
 * The database as operations see it: a drizzle handle over either driver, or a transaction
 * of one. Operations take a Db and open their own transaction inside it, which becomes a
 * savepoint when the caller (a test, a bulk import) already holds one.
 */
export type Db = PgDatabase<PgQueryResultHKT, typeof schema>;
