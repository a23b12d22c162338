import { randomUUID } from 'node:crypto';
import { setImmediate as nextTurn } from 'node:timers/promises';
import type { FieldProblem } from '../../../src/errors/DomainError.ts';
import type { Db } from '../../Db.ts';
import type { Actor } from '../Actor.ts';
import { checkImportRow, type CheckedRow } from './checkImportRow.ts';
import { implausibleRowProblems } from './implausibleRowProblems.ts';
import { insertImportedReadings } from './insertImportedReadings.ts';
import type { ParsedImport } from './ParsedImport.ts';
import type { PlausibilityContext } from './readPlausibilityContexts.ts';
import type { ImportProblems } from './refuseImportProblems.ts';

const CHUNK_ROWS = 4000;

export interface CheckedAndInserted extends ImportProblems {
  /** Ids of the inserted rows in file order; complete only when there are no problems. */
  readingIds: string[];
}

/**
 * Checks the parsed rows a chunk at a time and inserts each clean chunk while the next one is
 * checked, so validation in Node and index upkeep in PostgreSQL overlap instead of taking
 * turns. After the first problem nothing more is inserted but every row is still checked, so
 * the answer names all problems; the caller refuses the file and its transaction discards the
 * chunks already in.
 */
export async function checkAndInsertRows(
  tx: Db,
  actor: Actor,
  importId: string,
  parsed: ParsedImport,
  sites: ReadonlyMap<string, string>,
  contexts: ReadonlyMap<string, PlausibilityContext>,
): Promise<CheckedAndInserted> {
  const invalid: FieldProblem[] = [...parsed.problems];
  const implausible: FieldProblem[] = [];
  const readingIds: string[] = [];
  let checkedRows = 0;
  let inserting: Promise<void> = Promise.resolve();
  for (let start = 0; start < parsed.candidates.length; start += CHUNK_ROWS) {
    const rows: CheckedRow[] = [];
    for (const candidate of parsed.candidates.slice(start, start + CHUNK_ROWS)) {
      const result = checkImportRow(candidate, sites, parsed.fieldOf);
      invalid.push(...result.problems);
      if (result.row) rows.push(result.row);
    }
    checkedRows += rows.length;
    implausible.push(...implausibleRowProblems(contexts, rows, parsed.fieldOf));
    // The previous chunk must be in before the next is sent, and a failed insert ends the import.
    await inserting;
    if (invalid.length > 0 || implausible.length > 0) continue;
    const ids = rows.map(() => randomUUID());
    readingIds.push(...ids);
    inserting = Promise.resolve(insertImportedReadings(tx, actor, importId, rows, ids));
    // Its failure is awaited (and thrown) at the next chunk; until then it must not count as unhandled.
    inserting.catch(() => {});
    // The driver writes to its socket on a later turn; let it go out before the next chunk's checks.
    await nextTurn();
  }
  await inserting;
  return { invalid, implausible, checkedRows, readingIds };
}
