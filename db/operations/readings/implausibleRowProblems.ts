import type { FieldProblem } from '../../../src/errors/DomainError.ts';
import type { CheckedRow } from './checkImportRow.ts';
import { implausibleOrderMessage } from './implausibleOrderMessage.ts';
import type { PlausibilityContext } from './readPlausibilityContexts.ts';

/** The import's rule for implausible fringe orders: every such row is named, none is stored. */
export function implausibleRowProblems(contexts: ReadonlyMap<string, PlausibilityContext>, rows: readonly CheckedRow[], fieldOf: (path: readonly PropertyKey[]) => string): FieldProblem[] {
  return rows.flatMap((r) => {
    const context = contexts.get(r.siteId);
    const message = context && implausibleOrderMessage(context, r.columns);
    return message ? [{ row: r.row, field: fieldOf(['reading']), message }] : [];
  });
}
