import { randomUUID } from 'node:crypto';
import { and, eq } from 'drizzle-orm';
import type { Db } from '../../db/Db.ts';
import { annealingGuidanceEntries, annealingHouseCycles, annealingPlans, annealingRunModels, annealingRuns, models, ovenLogSamples, ovenLogs } from '../../db/schema/index.ts';

const SHARED_VERSION = 'archive-test-1';
const SHARED_KEY = 'archive-test.shared-cycle';

function planJson(peakC: number) {
  return {
    segments: [
      { kind: 'ramp', startH: 0, durationH: 10, startTemperatureC: 23, endTemperatureC: peakC, rateCPerH: (peakC - 23) / 10 },
      { kind: 'soak', startH: 10, durationH: 4, startTemperatureC: peakC, endTemperatureC: peakC },
      { kind: 'ramp', startH: 14, durationH: 20, startTemperatureC: peakC, endTemperatureC: 23, rateCPerH: (peakC - 23) / 20 },
    ],
  };
}

/**
 * Annealing records for one of the lab's models, written straight into the tables: a shared
 * guidance row (lab_id null, as a published catalogue entry) the lab's records point at, the
 * lab's own entry and its amendment, a house cycle, a plan and its correction, a run with its
 * load and an oven log with samples. Returns the shared row's id.
 */
export async function addAnnealingRecords(db: Db, labId: string): Promise<{ sharedGuidanceId: string }> {
  const [model] = await db.select().from(models).where(eq(models.labId, labId)).limit(1);
  if (!model) throw new Error('the lab needs a model first');
  const [existing] = await db.select().from(annealingGuidanceEntries).where(and(eq(annealingGuidanceEntries.key, SHARED_KEY), eq(annealingGuidanceEntries.catalogueVersion, SHARED_VERSION)));
  const sharedGuidanceId = existing?.id ?? randomUUID();
  const entry = (key: string, title: string) => ({ key, title, peakTemperatureC: 140 });
  if (!existing) {
    await db.insert(annealingGuidanceEntries).values({ id: sharedGuidanceId, key: SHARED_KEY, title: 'Shared test cycle', materialFamily: 'polycarbonate', catalogueVersion: SHARED_VERSION, cataloguePosition: 0, entry: entry(SHARED_KEY, 'Shared test cycle') });
  }
  const ownKey = 'lab.slow-cycle';
  const [own] = await db.insert(annealingGuidanceEntries).values({ labId, key: ownKey, title: 'Slow cycle', materialFamily: 'polycarbonate', entry: entry(ownKey, 'Slow cycle') }).returning();
  await db.insert(annealingGuidanceEntries).values({ labId, key: `${ownKey}.v2`, title: 'Slow cycle, longer soak', materialFamily: 'polycarbonate', entry: entry(`${ownKey}.v2`, 'Slow cycle, longer soak') });
  await db.insert(annealingHouseCycles).values({ labId, materialFamily: 'polycarbonate', guidanceEntryId: own!.id, reason: 'our oven runs cool' });
  await db.insert(annealingHouseCycles).values({ labId, materialFamily: 'polycarbonate', guidanceEntryId: sharedGuidanceId, reason: 'back to the published cycle' });
  const plan = { labId, modelId: model.id, guidanceEntryId: sharedGuidanceId, guidanceKey: SHARED_KEY, catalogueVersion: SHARED_VERSION, chosenBy: 'requested', maxSectionThicknessMm: 6, thicknessSource: 'model', startTemperatureC: 23, totalDurationH: 34, maxTemperatureC: 140, plan: planJson(140) };
  const [first] = await db.insert(annealingPlans).values(plan).returning();
  const [second] = await db.insert(annealingPlans).values({ ...plan, maxTemperatureC: 135, plan: planJson(135), supersedesId: first!.id, amendmentReason: 'peak lowered after a trial' }).returning();
  const [run] = await db.insert(annealingRuns).values({ labId, planId: second!.id, ovenName: 'oven 2', operator: 'R. Okafor', startedAt: new Date('2026-03-02T08:00:00Z') }).returning();
  await db.insert(annealingRunModels).values({ labId, runId: run!.id, modelId: model.id });
  const [log] = await db
    .insert(ovenLogs)
    .values({ labId, runId: run!.id, timeColumn: 'elapsed_h', sampleCount: 3, durationH: 34, minTemperatureC: 23, maxTemperatureC: 135.4, verdict: 'pass', comparison: { maxDeviationC: 0.4 }, bodySha256: 'a'.repeat(64) })
    .returning();
  await db.insert(ovenLogSamples).values([0, 12, 34].map((elapsedH, seq) => ({ labId, logId: log!.id, seq, elapsedH, temperatureC: [23, 135.4, 23.5][seq]! })));
  return { sharedGuidanceId };
}
