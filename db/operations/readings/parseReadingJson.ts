import { DomainError, type FieldProblem } from '../../../src/errors/DomainError.ts';
import { decodeImportText } from './decodeImportText.ts';
import type { ImportCandidate, ParsedImport } from './ParsedImport.ts';
import { readAmendmentCells } from './readAmendmentCells.ts';
import { readSiteReference } from './readSiteReference.ts';

const fieldOf = (path: readonly PropertyKey[]) => (path.length === 0 ? 'reading' : path.map(String).join('.'));

const refuse = (field: string, message: string): never => {
  throw new DomainError('invalid_input', `The JSON body is not usable: ${message}. Nothing was imported.`, [{ field, message }]);
};

function candidateOf(row: number, item: unknown, problems: FieldProblem[]): ImportCandidate | undefined {
  if (typeof item !== 'object' || item === null || Array.isArray(item)) {
    problems.push({ row, field: 'reading', message: 'each reading must be a JSON object' });
    return undefined;
  }
  // Keys an export writes beside the inputs: ignored on import, except the derived values,
  // which must agree with the raw inputs they came from.
  const { modelCode, siteLabel, siteId, fringeOrder, retardationNm, id, fringeOrderUncertainty: _u, supersedesId, amendmentReason, recordedAt: _r, ...reading } =
    item as Record<string, unknown>;
  const echo: ImportCandidate['echo'] = {};
  for (const [key, value] of [['fringeOrder', fringeOrder], ['retardationNm', retardationNm]] as const) {
    if (typeof value === 'number') echo[key] = value;
    else if (value !== undefined && value !== null) problems.push({ row, field: key, message: 'must be a number (or left out)' });
  }
  const site = readSiteReference(row, { siteId, modelCode, siteLabel }, fieldOf);
  const { problems: linkProblems, ...link } = readAmendmentCells(row, { id, supersedesId, amendmentReason }, fieldOf);
  problems.push(...site.problems, ...linkProblems);
  return { row, site: site.site, reading, echo, ...link };
}

/**
 * Reads `{ "readings": [ ... ] }`: each reading is a CreateReadingInput plus its site, named by
 * siteId or by modelCode and siteLabel. Rows are numbered from 1 in array order.
 */
export function parseReadingJson(body: Uint8Array): ParsedImport {
  let document: unknown;
  try {
    document = JSON.parse(decodeImportText(body));
  } catch (error) {
    if (error instanceof DomainError) throw error;
    refuse('body', `not valid JSON (${(error as Error).message})`);
  }
  const readings = (document as { readings?: unknown } | null)?.readings;
  if (!Array.isArray(readings)) refuse('readings', 'expected an object with a "readings" array');
  const problems: FieldProblem[] = [];
  const candidates = (readings as unknown[]).flatMap((item, index) => candidateOf(index + 1, item, problems) ?? []);
  return { format: 'json', candidates, problems, fieldOf };
}
