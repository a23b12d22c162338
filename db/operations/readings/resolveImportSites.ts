import { and, eq, or, sql } from 'drizzle-orm';
import type { Db } from '../../Db.ts';
import { models, sites } from '../../schema/index.ts';
import type { SiteReference } from './ParsedImport.ts';
import { siteKeyOf } from './siteKeyOf.ts';

/**
 * Finds every site an import names in one query. The names travel as one jsonb parameter each,
 * because a list of bind parameters per site breaks past PGlite's parameter limit.
 */
export async function resolveImportSites(db: Db, labId: string, refs: readonly (SiteReference | undefined)[]): Promise<Map<string, string>> {
  const ids = new Set<string>();
  const pairs = new Map<string, { code: string; label: string }>();
  for (const ref of refs) {
    if (!ref) continue;
    if ('siteId' in ref) ids.add(ref.siteId);
    else pairs.set(siteKeyOf(ref), { code: ref.modelCode, label: ref.siteLabel });
  }
  const found = new Map<string, string>();
  if (ids.size === 0 && pairs.size === 0) return found;
  const rows = await db
    .select({ id: sites.id, label: sites.label, code: models.code })
    .from(sites)
    .innerJoin(models, and(eq(models.id, sites.modelId), eq(models.labId, sites.labId)))
    .where(
      and(
        eq(sites.labId, labId),
        or(
          sql`${sites.id} in (select value::uuid from jsonb_array_elements_text(${JSON.stringify([...ids])}::jsonb))`,
          sql`(${models.code}, ${sites.label}) in (select x.code, x.label from jsonb_to_recordset(${JSON.stringify([...pairs.values()])}::jsonb) as x(code text, label text))`,
        ),
      ),
    );
  for (const row of rows) {
    if (ids.has(row.id)) found.set(siteKeyOf({ siteId: row.id }), row.id);
    found.set(siteKeyOf({ modelCode: row.code, siteLabel: row.label }), row.id);
  }
  return found;
}
