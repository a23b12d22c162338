import { sql } from 'drizzle-orm';
import { DomainError } from '../../src/errors/DomainError.ts';
import type { Db } from '../Db.ts';
import type { ArchiveStage } from './createArchiveStage.ts';

/**
 * Loads one chunk of a part's row lines into its temporary table in one statement with one
 * JSON parameter (the lines are joined, not parsed in Node). A row the database cannot read
 * names its part.
 *
 * @example
 * await stageArchiveRows(db, stage, ['{"id": "…", "name": "PC-2026-03"}']);
 */
export async function stageArchiveRows(db: Db, { part, stage }: ArchiveStage, lines: string[]): Promise<void> {
  try {
    await db.execute(sql`insert into ${sql.identifier(stage)}
      select * from jsonb_populate_recordset(null::${sql.identifier(stage)}, ${`[${lines.join(',')}]`}::jsonb)`);
  } catch (error) {
    throw new DomainError('invalid_input', `The archive is refused at part ${part.name}: its rows do not read as ${part.table} rows (${((error as { cause?: Error }).cause ?? (error as Error)).message}). Nothing was written.`);
  }
}
