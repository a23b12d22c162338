import { randomUUID } from 'node:crypto';
import { setImmediate as nextTurn } from 'node:timers/promises';
import type { FieldProblem } from '../../../src/errors/DomainError.ts';
import type { Db } from '../../Db.ts';
import type { Actor } from '../Actor.ts';
import { checkImportRow } from './checkImportRow.ts';
import { implausibleRowProblems } from './implausibleRowProblems.ts';
import { encodeImportRows, type ImportRow } from './encodeImportRows.ts';
import { insertImportedReadings } from './insertImportedReadings.ts';
import { linkImportAmendments } from './linkImportAmendments.ts';
import type { ParsedImport } from './ParsedImport.ts';
import type { PlausibilityContext } from './readPlausibilityContexts.ts';
import type { ImportProblems } from './refuseImportProblems.ts';

const CHUNK_ROWS = 4000;
// A chunk's insert is megabytes; the socket takes only part of it at once and the rest goes out
// when the event loop turns, so checking yields this often or the server waits for the whole check.
const YIELD_EVERY_ROWS = 500;

export interface CheckedAndInserted extends ImportProblems {
  /** Ids of the rows in file order; they were all inserted only when there are no problems. */
  readingIds: string[];
}

/**
 * Checks the parsed rows a chunk at a time (in file order, except that a reading goes in before
 * the row that supersedes it) and inserts each clean chunk while the next one is checked, so validation in Node and index upkeep in PostgreSQL overlap instead of taking
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
  const { candidates } = parsed;
  const links = linkImportAmendments(candidates, sites, parsed.fieldOf);
  const invalid: FieldProblem[] = [...parsed.problems, ...links.problems];
  const implausible: FieldProblem[] = [];
  // Made up front so an amendment can name the new id of the row it supersedes, wherever that is in the file.
  const readingIds = candidates.map(() => randomUUID());
  let checkedRows = 0;
  let inserting: Promise<void> = Promise.resolve();
  for (let start = 0; start < candidates.length; start += CHUNK_ROWS) {
    const rows: ImportRow[] = [];
    for (const [n, i] of links.order.slice(start, start + CHUNK_ROWS).entries()) {
      if (n > 0 && n % YIELD_EVERY_ROWS === 0) await nextTurn();
      const candidate = candidates[i]!;
      const result = checkImportRow(candidate, sites, parsed.fieldOf);
      invalid.push(...result.problems);
      if (!result.row) continue;
      const target = links.supersedes.get(i);
      // readAmendmentCells trimmed the reason and linkImportAmendments made sure there is one.
      rows.push({ ...result.row, id: readingIds[i]!, supersedesId: target === undefined ? null : readingIds[target]!, amendmentReason: target === undefined ? null : candidate.amends!.reason! });
    }
    checkedRows += rows.length;
    implausible.push(...implausibleRowProblems(contexts, rows, parsed.fieldOf));
    const clean = invalid.length === 0 && implausible.length === 0;
    // Encoded before waiting, so the server is idle only while the chunk travels.
    const encoded = clean ? encodeImportRows(rows) : undefined;
    // The previous chunk must be in before the next is sent, and a failed insert ends the import.
    await inserting;
    if (!encoded) continue;
    inserting = Promise.resolve(insertImportedReadings(tx, actor, importId, encoded));
    // Its failure is awaited (and thrown) at the next chunk; until then it must not count as unhandled.
    inserting.catch(() => {});
  }
  await inserting;
  return { invalid, implausible, checkedRows, readingIds };
}
