import type { Db } from './Db.ts';

/**
 * Builds a drizzle prepared statement once per database handle instead of on every call: for a
 * one-row read, building the select and its result mapping cost about three times the round trip
 * itself (on 2 cores: about 5,300 reads/s built each time against 16,000-18,000 prepared). A
 * transaction (a test, a caller sharing its own) gets its own statement, forgotten with it.
 *
 * @example
 * const siteById = preparedPerDatabase((db) => db.select().from(sites).where(eq(sites.id, sql.placeholder('id'))).prepare('site_by_id'));
 * await siteById(db).execute({ id });
 */
export function preparedPerDatabase<Statement>(prepare: (db: Db) => Statement): (db: Db) => Statement {
  const statements = new WeakMap<Db, Statement>();
  return (db) => {
    let statement = statements.get(db);
    if (!statement) {
      statement = prepare(db);
      statements.set(db, statement);
    }
    return statement;
  };
}
