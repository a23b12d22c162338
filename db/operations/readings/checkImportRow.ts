import type { z } from 'zod';
import { DomainError, type FieldProblem } from '../../../src/errors/DomainError.ts';
import { CreateReadingInput } from '../../inputs/readings.ts';
import { deriveReadingColumns } from './deriveReadingColumns.ts';
import type { ImportCandidate, ParsedImport } from './ParsedImport.ts';
import { siteKeyOf } from './siteKeyOf.ts';

const MAX_FRINGE_ORDER = 200;

export interface CheckedRow {
  row: number;
  siteId: string;
  columns: ReturnType<typeof deriveReadingColumns>;
}

function issueProblems(row: number, issue: z.core.$ZodIssue, fieldOf: ParsedImport['fieldOf']): FieldProblem[] {
  if (issue.code === 'unrecognized_keys') {
    const where = issue.path[issue.path.length - 1] === 'reading' ? 'not an input of this method' : 'unknown field';
    return issue.keys.map((key) => ({ row, field: fieldOf([...issue.path, key]), message: where }));
  }
  return [{ row, field: fieldOf(issue.path), message: issue.message }];
}

// An export writes the derived values; if someone edited the raw inputs but not those, the
// file contradicts itself and the user should decide which is right.
function echoProblems(candidate: ImportCandidate, columns: CheckedRow['columns'], fieldOf: ParsedImport['fieldOf']): FieldProblem[] {
  const derived = { fringeOrder: columns.fringeOrder, retardationNm: columns.retardationNm };
  return (['fringeOrder', 'retardationNm'] as const).flatMap((key) => {
    const given = candidate.echo[key];
    if (given === undefined || Math.abs(given - derived[key]) <= 1e-9 * Math.max(1, Math.abs(derived[key]))) return [];
    return [{ row: candidate.row, field: fieldOf([key]), message: `${given} disagrees with ${derived[key]} derived from the raw inputs; correct it or leave it empty` }];
  });
}

/**
 * Validates one row with the same rules as a single reading: its site must exist, its cells
 * must pass CreateReadingInput, the core must derive a fringe order from them, and the values an
 * export echoes must agree with that derivation. Returns the row to store or its problems.
 */
export function checkImportRow(candidate: ImportCandidate, sites: ReadonlyMap<string, string>, fieldOf: ParsedImport['fieldOf']): { row?: CheckedRow; problems: FieldProblem[] } {
  const { row } = candidate;
  const problems: FieldProblem[] = [];
  const siteId = candidate.site && sites.get(siteKeyOf(candidate.site));
  if (candidate.site && !siteId) {
    const field = fieldOf(['siteId' in candidate.site ? 'siteId' : 'siteLabel']);
    const named = 'siteId' in candidate.site ? candidate.site.siteId : `${candidate.site.siteLabel}" on model "${candidate.site.modelCode}`;
    problems.push({ row, field, message: `no site "${named}" in this lab` });
  }
  const parsed = CreateReadingInput.safeParse(candidate.reading);
  if (!parsed.success) return { problems: [...problems, ...parsed.error.issues.flatMap((issue) => issueProblems(row, issue, fieldOf))] };
  let columns: CheckedRow['columns'];
  try {
    columns = deriveReadingColumns(parsed.data);
  } catch (error) {
    if (!(error instanceof DomainError)) throw error;
    const fromCore = error.problems.length > 0 ? error.problems : [{ field: 'reading', message: error.message }];
    return { problems: [...problems, ...fromCore.map((p) => ({ row, field: fieldOf([p.field]), message: p.message }))] };
  }
  if (columns.fringeOrder > MAX_FRINGE_ORDER) problems.push({ row, field: fieldOf(['reading']), message: `gives fringe order ${columns.fringeOrder}, above ${MAX_FRINGE_ORDER}` });
  problems.push(...echoProblems(candidate, columns, fieldOf));
  return problems.length > 0 || !siteId ? { problems } : { row: { row, siteId, columns }, problems };
}
