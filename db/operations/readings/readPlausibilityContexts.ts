import { and, eq, sql } from 'drizzle-orm';
import type { Db } from '../../Db.ts';
import { batches, materials, models, sites } from '../../schema/index.ts';

export interface PlausibilityContext {
  modelCode: string;
  materialFamily: string;
  /** The site's own thickness where it has one, else the model's. */
  thicknessMm: number;
  fringeValueNPerMm: number;
  fringeValueWavelengthNm: number;
}

/**
 * What the plausibility of a fringe order at each site depends on, for many sites in one query
 * (ids travel as one jsonb parameter: PGlite breaks past about 1,600 bind parameters).
 */
export async function readPlausibilityContexts(db: Db, labId: string, siteIds: readonly string[]): Promise<Map<string, PlausibilityContext>> {
  const unique = [...new Set(siteIds)];
  if (unique.length === 0) return new Map();
  const rows = await db
    .select({
      siteId: sites.id,
      modelCode: models.code,
      materialFamily: materials.family,
      thicknessMm: sql<number>`coalesce(${sites.localThicknessMm}, ${models.thicknessMm})`.mapWith(Number),
      fringeValueNPerMm: materials.fringeValueNPerMm,
      fringeValueWavelengthNm: materials.fringeValueWavelengthNm,
    })
    .from(sites)
    .innerJoin(models, and(eq(models.id, sites.modelId), eq(models.labId, sites.labId)))
    .innerJoin(batches, and(eq(batches.id, models.batchId), eq(batches.labId, models.labId)))
    .innerJoin(materials, and(eq(materials.id, batches.materialId), eq(materials.labId, batches.labId)))
    .where(and(eq(sites.labId, labId), sql`${sites.id} in (select value::uuid from jsonb_array_elements_text(${JSON.stringify(unique)}::jsonb))`));
  return new Map(rows.map(({ siteId, ...context }) => [siteId, context]));
}
