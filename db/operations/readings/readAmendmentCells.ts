import type { FieldProblem } from '../../../src/errors/DomainError.ts';
import type { ImportCandidate } from './ParsedImport.ts';

export interface AmendmentCells {
  id: unknown;
  supersedesId: unknown;
  amendmentReason: unknown;
}

const absent = (value: unknown) => value === undefined || value === null || value === '';

const MAX_LENGTH = { id: 100, supersedesId: 100, amendmentReason: 500 } as const;

/**
 * What an export wrote of a row's identity and amendment: the row's id in the file, and the id
 * of the row it supersedes with the reason. Each is text if given (null or empty is not given),
 * without NUL characters, and within its length, whether or not a link is rebuilt from it.
 */
export function readAmendmentCells(row: number, cells: AmendmentCells, fieldOf: (path: readonly PropertyKey[]) => string): Pick<ImportCandidate, 'fileId' | 'amends'> & { problems: FieldProblem[] } {
  // Files that are not exports name none of these: answer them without building anything.
  if (absent(cells.id) && absent(cells.supersedesId) && absent(cells.amendmentReason)) return { problems: [] };
  const problems: FieldProblem[] = [];
  const text = (key: keyof AmendmentCells): string | undefined => {
    const value = cells[key];
    if (absent(value)) return undefined;
    const problem = (message: string) => problems.push({ row, field: fieldOf([key]), message });
    if (typeof value !== 'string') return void problem('must be text (or left out)');
    if (value.includes('\u0000')) return void problem('must not contain a NUL character');
    if (value.length > MAX_LENGTH[key]) return void problem(`must be at most ${MAX_LENGTH[key]} characters`);
    return value.trim() || undefined;
  };
  const fileId = text('id');
  const supersedesId = text('supersedesId');
  const reason = text('amendmentReason');
  return { ...(fileId ? { fileId } : {}), ...(supersedesId ? { amends: { fileId: supersedesId, reason } } : {}), problems };
}
