import { and, asc, eq } from 'drizzle-orm';
import type { Db } from '../../Db.ts';
import { batches, materials, modelEvents, sites } from '../../schema/index.ts';
import type { Actor } from '../Actor.ts';
import { getModel } from './getModel.ts';

const HOUR_MS = 3_600_000;

/**
 * A model with its batch, material, sites and fabrication timeline, plus what the timeline
 * implies now: time since the last machining and the last storage conditions.
 */
export async function getModelDetail(db: Db, actor: Actor, id: string, now: Date = new Date()) {
  const model = await getModel(db, actor, id);
  const [[origin], modelSites, timeline] = await Promise.all([
    db
      .select({ batch: batches, material: materials })
      .from(batches)
      .innerJoin(materials, eq(materials.id, batches.materialId))
      .where(and(eq(batches.id, model.batchId), eq(batches.labId, actor.labId))),
    db.select().from(sites).where(eq(sites.modelId, model.id)).orderBy(asc(sites.createdAt), asc(sites.id)),
    db.select().from(modelEvents).where(eq(modelEvents.modelId, model.id)).orderBy(asc(modelEvents.occurredAt), asc(modelEvents.id)),
  ]);
  const lastOf = (kind: string) => timeline.filter((e) => e.kind === kind).at(-1);
  const machined = lastOf('machined');
  const stored = lastOf('stored');
  return {
    model,
    batch: origin!.batch,
    material: origin!.material,
    sites: modelSites,
    timeline,
    derived: {
      lastMachinedAt: machined?.occurredAt ?? null,
      hoursSinceMachining: machined ? Math.max(0, (now.getTime() - machined.occurredAt.getTime()) / HOUR_MS) : null,
      lastMachiningMethod: machined?.machiningMethod ?? null,
      storage: stored
        ? { since: stored.occurredAt, temperatureC: stored.temperatureC, relativeHumidityPct: stored.relativeHumidityPct }
        : null,
    },
  };
}
