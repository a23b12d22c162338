import { and, asc, eq, inArray, notExists } from 'drizzle-orm';
import { alias } from 'drizzle-orm/pg-core';
import type { Db } from '../../Db.ts';
import { batches, calibrations, materials, models, readings, sites } from '../../schema/index.ts';
import type { Actor } from '../Actor.ts';
import { type CriteriaRow, criteriaInForceFor } from './criteriaInForceFor.ts';

export interface AnalysisInputs {
  model: typeof models.$inferSelect;
  material: typeof materials.$inferSelect;
  /** In the order they were added. */
  sites: (typeof sites.$inferSelect)[];
  /** Current readings (not superseded) of those sites, oldest first. */
  readings: (typeof readings.$inferSelect)[];
  /** The batch's calibrations, oldest first. */
  calibrations: (typeof calibrations.$inferSelect)[];
  criteria: CriteriaRow | null;
}

/**
 * Everything a residual analysis reads, for many models at once: one query per table whatever
 * the number of models (the lab overview judges a page of them). Models not in the lab are left out.
 */
export async function readAnalysisInputs(db: Db, actor: Actor, modelIds: readonly string[]): Promise<Map<string, AnalysisInputs>> {
  if (modelIds.length === 0) return new Map();
  const origins = await db
    .select({ model: models, material: materials })
    .from(models)
    .innerJoin(batches, and(eq(batches.id, models.batchId), eq(batches.labId, models.labId)))
    .innerJoin(materials, and(eq(materials.id, batches.materialId), eq(materials.labId, batches.labId)))
    .where(and(eq(models.labId, actor.labId), inArray(models.id, [...modelIds])));
  if (origins.length === 0) return new Map();
  const found = origins.map((o) => o.model);
  const modelSites = await db.select().from(sites).where(and(eq(sites.labId, actor.labId), inArray(sites.modelId, found.map((m) => m.id)))).orderBy(asc(sites.createdAt), asc(sites.id));
  const successor = alias(readings, 'successor');
  const [siteReadings, batchCalibrations, criteria] = await Promise.all([
    modelSites.length === 0
      ? Promise.resolve([])
      : db
          .select()
          .from(readings)
          .where(and(inArray(readings.siteId, modelSites.map((s) => s.id)), notExists(db.select({ one: successor.id }).from(successor).where(eq(successor.supersedesId, readings.id)))))
          .orderBy(asc(readings.observedAt)),
    db.select().from(calibrations).where(inArray(calibrations.batchId, [...new Set(found.map((m) => m.batchId))])).orderBy(asc(calibrations.observedAt)),
    criteriaInForceFor(db, actor.labId, found),
  ]);
  const modelOfSite = new Map(modelSites.map((s) => [s.id, s.modelId]));
  return new Map(
    origins.map(({ model, material }) => [
      model.id,
      {
        model,
        material,
        sites: modelSites.filter((s) => s.modelId === model.id),
        readings: siteReadings.filter((r) => modelOfSite.get(r.siteId) === model.id),
        calibrations: batchCalibrations.filter((c) => c.batchId === model.batchId),
        criteria: criteria.get(model.id) ?? null,
      },
    ]),
  );
}
