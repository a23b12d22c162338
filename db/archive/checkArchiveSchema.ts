import { DomainError } from '../../src/errors/DomainError.ts';
import type { Db } from '../Db.ts';
import type { ArchiveSchemaVersion } from './archiveFormat.ts';
import { localMigrations } from './localMigrations.ts';
import { readSchemaVersion } from './readSchemaVersion.ts';

export interface SchemaCheck {
  database: string;
  /** Migrations this database has and the archive's did not; their columns get defaults. */
  upgradedThrough: string[];
}

const CHANGES_ROWS = /^(update|delete|insert|truncate|copy|merge)\b/i;

function changesRows(statement: string): boolean {
  const code = statement.replace(/^(\s*--[^\n]*\n)*/, '').trim();
  return CHANGES_ROWS.test(code);
}

/**
 * Decides whether an archive's schema can be restored here. Same version: yes. Older (its
 * newest migration is one this database has applied): yes, as long as no later migration
 * rewrites rows — restoring inserts the archived columns into today's tables and lets newer
 * columns take their defaults, which is what those migrations did to existing rows only if
 * they just add tables, columns, constraints or triggers. Newer or from another history: no.
 *
 * @example
 * await checkArchiveSchema(db, opening.schema);
 * // { database: '0006_annealing_records_are_immutable', upgradedThrough: ['0005_annealing_records', '0006_…'] }
 */
export async function checkArchiveSchema(db: Db, archived: ArchiveSchemaVersion): Promise<SchemaCheck> {
  const here = await readSchemaVersion(db);
  const database = here.latest.migration;
  if (archived.hash === here.latest.hash) return { database, upgradedThrough: [] };
  if (here.appliedHashes.has(archived.hash)) {
    const later = localMigrations().filter((m) => m.migratedAt > archived.migratedAt && here.appliedHashes.has(m.hash));
    const rewriting = later.filter((m) => m.statements.some(changesRows));
    if (rewriting.length > 0) {
      throw new DomainError('invalid_input', `The archive's schema (${archived.migration}) predates migration ${rewriting.map((m) => m.tag).join(', ')}, which changes existing rows; inserting the archived rows would skip that change, so the archive is refused.`);
    }
    return { database, upgradedThrough: later.map((m) => m.tag) };
  }
  if (archived.migratedAt > here.latest.migratedAt) {
    throw new DomainError('invalid_input', `The archive was written by a newer schema (${archived.migration}) than this database has (${database}). Update this installation and start it once so it migrates, then import again.`);
  }
  throw new DomainError('invalid_input', `The archive's schema (${archived.migration}, ${archived.hash.slice(0, 12)}…) is not in this database's migration history (newest ${database}); it comes from a different line of the project.`);
}
