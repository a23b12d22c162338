import { DomainError, type FieldProblem } from '../../../src/errors/DomainError.ts';

const MAX_LISTED_PROBLEMS = 200;
const MAX_LISTED_IMPLAUSIBLE = 200;

export interface ImportProblems {
  /** Rows that break the rules of a single reading, or name no site. */
  invalid: FieldProblem[];
  /** Rows whose fringe order the model could not show; reported only when nothing is invalid. */
  implausible: FieldProblem[];
  /** Rows that passed every check. */
  checkedRows: number;
}

function refuseInvalid(problems: readonly FieldProblem[]): never {
  // A cell that is not a number also fails the schema; the cell's own message is the useful one.
  const seen = new Set<string>();
  const unique = problems.filter((p) => !seen.has(`${p.row}|${p.field}`) && Boolean(seen.add(`${p.row}|${p.field}`)));
  unique.sort((a, b) => (a.row ?? 0) - (b.row ?? 0));
  const listed = unique.slice(0, MAX_LISTED_PROBLEMS);
  const more = unique.length - listed.length;
  if (more > 0) listed.push({ field: 'file', message: `and ${more} more problems not listed` });
  const badRows = new Set(unique.map((p) => p.row)).size;
  throw new DomainError('invalid_input', `${unique.length} problem${unique.length === 1 ? '' : 's'} in ${badRows} row${badRows === 1 ? '' : 's'}; nothing was imported.`, listed);
}

function refuseImplausible(problems: readonly FieldProblem[]): never {
  const listed = problems.length > MAX_LISTED_IMPLAUSIBLE ? [...problems.slice(0, MAX_LISTED_IMPLAUSIBLE), { field: 'file', message: `${problems.length - MAX_LISTED_IMPLAUSIBLE} more rows like these` }] : [...problems];
  throw new DomainError('implausible_value', `${problems.length} row${problems.length === 1 ? '' : 's'} hold a fringe order the model could not show; nothing was imported.`, listed);
}

/**
 * Refuses a file for every problem found in it at once, so a user fixes the whole sheet in one
 * pass: rule breaks first (sorted by row, one message per cell), else implausible orders.
 * A file with no problems and no rows is refused too.
 */
export function refuseImportProblems({ invalid, implausible, checkedRows }: ImportProblems): void {
  if (invalid.length > 0) refuseInvalid(invalid);
  if (checkedRows === 0) throw new DomainError('invalid_input', 'The file has no readings. Nothing was imported.', [{ field: 'file', message: 'no readings' }]);
  if (implausible.length > 0) refuseImplausible(implausible);
}
