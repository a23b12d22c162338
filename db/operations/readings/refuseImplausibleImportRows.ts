import { DomainError, type FieldProblem } from '../../../src/errors/DomainError.ts';
import type { Db } from '../../Db.ts';
import type { CheckedRow } from './checkImportRows.ts';
import { implausibleOrderMessage } from './implausibleOrderMessage.ts';
import { readPlausibilityContexts } from './readPlausibilityContexts.ts';

const MAX_LISTED = 200;

/** The import's rule for implausible fringe orders: the whole file is refused, every such row named. */
export async function refuseImplausibleImportRows(db: Db, labId: string, rows: readonly CheckedRow[], fieldOf: (path: readonly PropertyKey[]) => string): Promise<void> {
  const contexts = await readPlausibilityContexts(db, labId, rows.map((r) => r.siteId));
  const problems: FieldProblem[] = rows.flatMap((r) => {
    const context = contexts.get(r.siteId);
    const message = context && implausibleOrderMessage(context, r.columns);
    return message ? [{ row: r.row, field: fieldOf(['reading']), message }] : [];
  });
  if (problems.length === 0) return;
  const listed = problems.length > MAX_LISTED ? [...problems.slice(0, MAX_LISTED), { field: 'file', message: `${problems.length - MAX_LISTED} more rows like these` }] : problems;
  throw new DomainError('implausible_value', `${problems.length} row${problems.length === 1 ? '' : 's'} hold a fringe order the model could not show; nothing was imported.`, listed);
}
