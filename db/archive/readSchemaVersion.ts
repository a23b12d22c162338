import { sql } from 'drizzle-orm';
import type { Db } from '../Db.ts';
import { rowsOf } from '../rowsOf.ts';
import type { ArchiveSchemaVersion } from './archiveFormat.ts';
import { localMigrations } from './localMigrations.ts';

export interface AppliedSchema {
  latest: ArchiveSchemaVersion;
  appliedHashes: Set<string>;
}

/**
 * The schema version of a database: its newest applied drizzle migration, named by the tag in
 * this checkout's journal (a hash this checkout does not know keeps a placeholder tag).
 *
 * @example
 * (await readSchemaVersion(db)).latest.migration; // '0006_annealing_records_are_immutable'
 */
export async function readSchemaVersion(db: Db): Promise<AppliedSchema> {
  // bigint comes back as a string on postgres.js and a number on PGlite.
  const applied = rowsOf<{ hash: string; created_at: string | number }>(
    await db.execute(sql`select hash, created_at from drizzle.__drizzle_migrations order by created_at, id`),
  );
  const newest = applied.at(-1);
  if (!newest) throw new Error('The database has no applied migrations; start the service once (or run the import, which migrates) first.');
  const local = localMigrations().find((m) => m.hash === newest.hash);
  return {
    latest: { migration: local?.tag ?? `unknown_${newest.created_at}`, hash: newest.hash, migratedAt: Number(newest.created_at), migrationCount: applied.length },
    appliedHashes: new Set(applied.map((m) => m.hash)),
  };
}
