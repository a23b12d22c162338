import type { FieldProblem } from '../../../src/errors/DomainError.ts';
import type { ImportCandidate, ParsedImport } from './ParsedImport.ts';
import { siteKeyOf } from './siteKeyOf.ts';

/**
 * Rebuilds the amendments of an exported file that holds superseded readings too: a row whose
 * supersedes id is the id of another row of the same file will supersede that row's new
 * reading, as amendReading would have made it (same site, a reason, one successor each, no
 * loop). A supersedes id that names no row of the file is dropped, so an export of current
 * readings imports as plain originals. Rows of one transaction share their recorded time, so
 * an export may list an amendment before the reading it supersedes: `order` is the order to
 * insert in, every reading before the row that supersedes it, else as in the file.
 */
export function linkImportAmendments(candidates: readonly ImportCandidate[], sites: ReadonlyMap<string, string>, fieldOf: ParsedImport['fieldOf']): { supersedes: Map<number, number>; order: number[]; problems: FieldProblem[] } {
  const indexOfId = new Map<string, number>();
  const problems: FieldProblem[] = [];
  candidates.forEach((c, i) => {
    if (c.fileId === undefined) return;
    const first = indexOfId.get(c.fileId);
    if (first === undefined) indexOfId.set(c.fileId, i);
    else problems.push({ row: c.row, field: fieldOf(['id']), message: `"${c.fileId}" is also the id of row ${candidates[first]!.row}` });
  });
  const supersedes = new Map<number, number>();
  const successorOf = new Map<number, number>();
  const siteOf = (c: ImportCandidate) => c.site && sites.get(siteKeyOf(c.site));
  candidates.forEach((c, i) => {
    const target = c.amends && indexOfId.get(c.amends.fileId);
    if (!c.amends || target === undefined) return;
    const superseded = candidates[target]!;
    const problem = (key: string, message: string) => problems.push({ row: c.row, field: fieldOf([key]), message });
    if (target === i) return problem('supersedesId', 'a reading cannot supersede itself');
    if (successorOf.has(target)) return problem('supersedesId', `row ${candidates[successorOf.get(target)!]!.row} already supersedes row ${superseded.row}`);
    if (siteOf(c) !== siteOf(superseded)) return problem('supersedesId', `supersedes row ${superseded.row}, a reading at another site`);
    if (!c.amends.reason?.trim()) return problem('amendmentReason', `an amendment of row ${superseded.row} needs its reason`);
    successorOf.set(target, i);
    supersedes.set(i, target);
  });
  // Each row supersedes at most one and is superseded by at most one, so links form chains, or loops.
  const depth = new Map<number, number>();
  const depthOf = (start: number): number => {
    const path: number[] = [];
    let at: number | undefined = start;
    while (at !== undefined && !depth.has(at)) {
      if (path.includes(at)) {
        problems.push({ row: candidates[start]!.row, field: fieldOf(['supersedesId']), message: `supersedes in a loop through rows ${path.map((k) => candidates[k]!.row).join(', ')}` });
        for (const k of path) depth.set(k, 0);
        return 0;
      }
      path.push(at);
      at = supersedes.get(at);
    }
    let d = at === undefined ? -1 : depth.get(at)!;
    for (let k = path.length - 1; k >= 0; k--) depth.set(path[k]!, ++d);
    return depth.get(start)!;
  };
  const order = candidates.map((_, i) => i);
  if (supersedes.size > 0) {
    // In file order, so a loop is reported at its first row.
    for (const i of order) depthOf(i);
    order.sort((a, b) => depth.get(a)! - depth.get(b)! || a - b);
  }
  return { supersedes, order, problems };
}
