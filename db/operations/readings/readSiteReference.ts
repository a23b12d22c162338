import { z } from 'zod';
import type { FieldProblem } from '../../../src/errors/DomainError.ts';
import type { SiteReference } from './ParsedImport.ts';

export interface SiteCells {
  siteId: unknown;
  modelCode: unknown;
  siteLabel: unknown;
}

const given = (value: unknown) => value !== undefined && value !== null && value !== '';
const isUuid = (value: unknown) => z.uuid().safeParse(value).success;

/**
 * A row names its site by id or, since spreadsheets do not know ids, by model code and site
 * label. Naming it both ways is refused rather than guessing which one the user meant.
 */
export function readSiteReference(row: number, cells: SiteCells, fieldOf: (path: readonly PropertyKey[]) => string): { site?: SiteReference; problems: FieldProblem[] } {
  const problem = (key: string, message: string) => ({ problems: [{ row, field: fieldOf([key]), message }] });
  if (given(cells.siteId)) {
    if (given(cells.modelCode) || given(cells.siteLabel)) {
      return problem('siteId', `name the site either by ${fieldOf(['siteId'])} or by ${fieldOf(['modelCode'])} and ${fieldOf(['siteLabel'])}, not both`);
    }
    if (!isUuid(cells.siteId)) return problem('siteId', `"${String(cells.siteId)}" is not a site id (a UUID)`);
    return { site: { siteId: String(cells.siteId).toLowerCase() }, problems: [] };
  }
  const problems: FieldProblem[] = [];
  for (const key of ['modelCode', 'siteLabel'] as const) {
    const value = cells[key];
    if (typeof value !== 'string' || value.trim() === '') {
      problems.push({ row, field: fieldOf([key]), message: `needed to find the site (or give ${fieldOf(['siteId'])})` });
    }
  }
  if (problems.length > 0) return { problems };
  return { site: { modelCode: String(cells.modelCode).trim(), siteLabel: String(cells.siteLabel).trim() }, problems };
}
