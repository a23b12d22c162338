import { randomBytes } from 'node:crypto';
import { sql } from 'drizzle-orm';
import { DomainError } from '../../src/errors/DomainError.ts';
import type { Db } from '../Db.ts';
import type { ArchivePartPlan } from './archiveFormat.ts';
import { tableColumns } from './tableColumns.ts';

export interface ArchiveStage {
  part: ArchivePartPlan;
  /** A temporary table with the part's columns and none of the target's constraints. */
  stage: string;
}

/**
 * A temporary table for one part, so rows can be loaded and checked before any lasting table
 * is touched, then moved in one statement (which checks foreign keys at its end, so rows that
 * point at each other, like a correction and the reading it supersedes, need no order). Refuses
 * a part whose table or columns this database lacks, or that misses a column it requires.
 *
 * @example
 * (await createArchiveStage(db, readingsPart)).stage; // 'archive_stage_3f9a1c_readings'
 */
export async function createArchiveStage(db: Db, part: ArchivePartPlan): Promise<ArchiveStage> {
  const target = await tableColumns(db, part.table);
  if (target.length === 0) throw new DomainError('invalid_input', `The archive's part ${part.name} is for table ${part.table}, which this database does not have.`);
  const missing = part.columns.filter((c) => !target.some((t) => t.name === c));
  if (missing.length > 0) throw new DomainError('invalid_input', `The archive's part ${part.name} has columns ${missing.join(', ')} that this database's ${part.table} does not have.`);
  const required = target.filter((t) => t.required && t.name !== 'lab_id' && !part.columns.includes(t.name));
  if (required.length > 0) throw new DomainError('invalid_input', `This database's ${part.table} requires ${required.map((c) => c.name).join(', ')}, which the archive's part ${part.name} does not carry.`);
  const stage = `archive_stage_${randomBytes(3).toString('hex')}_${part.name.replace(/\W/g, '_')}`.slice(0, 63);
  const columns = sql.join(part.columns.map((c) => sql.identifier(c)), sql`, `);
  await db.execute(sql`create temporary table ${sql.identifier(stage)} on commit drop as select ${columns} from ${sql.identifier(part.table)} with no data`);
  return { part, stage };
}
