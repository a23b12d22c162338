import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { readMigrationFiles } from 'drizzle-orm/migrator';
import { MIGRATIONS_FOLDER } from '../migrateDatabase.ts';

export interface LocalMigration {
  tag: string;
  hash: string;
  migratedAt: number;
  statements: string[];
}

/**
 * The migrations this checkout ships, with drizzle's own hashes, so a database's applied list
 * (hashes and times only) can be named by tag.
 *
 * @example
 * localMigrations()[0]?.tag; // '0000_foundation'
 */
export function localMigrations(): LocalMigration[] {
  const journal = JSON.parse(readFileSync(join(MIGRATIONS_FOLDER, 'meta', '_journal.json'), 'utf8')) as { entries: { when: number; tag: string }[] };
  const tags = new Map(journal.entries.map((e) => [e.when, e.tag]));
  return readMigrationFiles({ migrationsFolder: MIGRATIONS_FOLDER }).map((m) => ({
    tag: tags.get(m.folderMillis) ?? `unknown_${m.folderMillis}`,
    hash: m.hash,
    migratedAt: m.folderMillis,
    statements: m.sql,
  }));
}
