import { and, eq } from 'drizzle-orm';
import type { Db } from '../db/Db.ts';
import type { Actor } from '../db/operations/Actor.ts';
import { createLab } from '../db/operations/createLab.ts';
import { createApiKey, type CreatedApiKey } from '../db/operations/keys/createApiKey.ts';
import { createBatch } from '../db/operations/materials/createBatch.ts';
import { createModel } from '../db/operations/models/createModel.ts';
import { createSite } from '../db/operations/models/createSite.ts';
import { recordModelEvent } from '../db/operations/models/recordModelEvent.ts';
import { amendReading } from '../db/operations/readings/amendReading.ts';
import { recordReading } from '../db/operations/readings/recordReading.ts';
import { materials } from '../db/schema/index.ts';
import { loadDemoAnnealing } from './demoAnnealing.ts';
import { loadDemoCalibrationsAndLimits } from './demoCalibrationsAndLimits.ts';
import { DEMO_BATCHES, DEMO_LAB_NAME, DEMO_MODELS, DEMO_OPERATORS, type DemoModel, type DemoReading } from './demoScenario.ts';

const HOUR_MS = 3_600_000;

export interface LoadedDemo {
  labId: string;
  labName: string;
  keys: CreatedApiKey[];
}

function readingMethod(r: DemoReading) {
  if (r.tardy) return { method: 'tardy' as const, lowerOrder: r.tardy[0], analyzerRotationDeg: r.tardy[1], movedFringe: 'lower' as const };
  return { method: 'whole_order' as const, wholeOrder: r.wholeOrder ?? 0 };
}

async function loadModel(db: Db, actor: Actor, batchId: string, spec: DemoModel, now: number, index: number) {
  const { sites: siteSpecs, machiningMethod, tool, machinedDaysAgo, batch: _batch, ...geometry } = spec;
  const project = spec.batch.startsWith('PC') ? { project: 'notch residual study' } : {};
  const model = await createModel(db, actor, { ...geometry, ...project, batchId, thicknessUncertaintyMm: 0.02 });
  const machinedAt = now - machinedDaysAgo * 24 * HOUR_MS;
  const operator = DEMO_OPERATORS[index % DEMO_OPERATORS.length]!;
  const at = (hours: number) => new Date(machinedAt + hours * HOUR_MS).toISOString();
  if (spec.batch.startsWith('EP')) {
    await recordModelEvent(db, actor, model.id, { kind: 'cast', occurredAt: at(-24 * 12), operator, notes: 'poured at 60 °C into a silicone mould', details: {} });
    await recordModelEvent(db, actor, model.id, { kind: 'cured', occurredAt: at(-24 * 10), operator, temperatureC: 120, details: { hours: 16 } });
  }
  await recordModelEvent(db, actor, model.id, { kind: 'machined', occurredAt: at(0), operator, machiningMethod, tool, details: {} });
  await recordModelEvent(db, actor, model.id, { kind: 'polished', occurredAt: at(1), operator, notes: 'edges wet-polished, 1200 grit then paste', details: {} });
  await recordModelEvent(db, actor, model.id, { kind: 'stored', occurredAt: at(1.5), operator, temperatureC: 23, relativeHumidityPct: 45, details: {} });
  for (const siteSpec of siteSpecs) {
    const site = await createSite(db, actor, model.id, { label: siteSpec.label, kind: siteSpec.kind, onFreeEdge: true });
    for (const r of siteSpec.readings) {
      await recordReading(db, actor, site.id, {
        stage: r.stage,
        ...(r.loadN !== undefined ? { loadN: r.loadN } : {}),
        observedAt: at(r.atHours),
        operator,
        wavelengthNm: 577,
        reading: readingMethod(r),
        sign: r.sign ?? 'unknown',
      });
    }
  }
  return model;
}

/**
 * Creates the demo lab through the same operations the API uses, so its data passes every
 * check real data passes. Times are set relative to now, so the stored model stays "about to
 * pass its limit" whenever the demo is loaded.
 */
export async function loadDemoScenario(db: Db, now: number = Date.now()): Promise<LoadedDemo> {
  return db.transaction(async (tx) => {
    const lab = await createLab(tx, DEMO_LAB_NAME);
    const actor: Actor = { labId: lab.labId, keyId: lab.adminKey.id, role: 'admin' };
    const technician = await createApiKey(tx, lab.labId, { label: 'demo technician', role: 'technician' });
    const viewer = await createApiKey(tx, lab.labId, { label: 'demo viewer', role: 'viewer' });
    const batchIds = new Map<string, string>();
    for (const b of DEMO_BATCHES) {
      const [material] = await tx.select().from(materials).where(and(eq(materials.labId, lab.labId), eq(materials.name, b.material)));
      const batch = await createBatch(tx, actor, { code: b.code, kind: b.kind, materialId: material!.id, ...('supplierLot' in b ? { supplierLot: b.supplierLot } : {}) });
      batchIds.set(b.code, batch.id);
    }
    let index = 0;
    for (const spec of DEMO_MODELS) await loadModel(tx, actor, batchIds.get(spec.batch)!, spec, now, index++);
    await loadDemoCalibrationsAndLimits(tx, actor, batchIds, now);
    await loadDemoAnnealing(tx, actor, now);
    await amendFirstReadingOf(tx, actor);
    return { labId: lab.labId, labName: DEMO_LAB_NAME, keys: [lab.adminKey, technician, viewer] };
  });
}

/** One corrected reading, so the demo shows an amendment chain. */
async function amendFirstReadingOf(db: Db, actor: Actor) {
  const { readings } = await import('../db/schema/index.ts');
  const [first] = await db.select().from(readings).where(eq(readings.labId, actor.labId)).orderBy(readings.observedAt).limit(1);
  if (!first) return;
  await amendReading(db, actor, first.id, {
    stage: first.stage,
    observedAt: first.observedAt.toISOString(),
    operator: first.operator,
    wavelengthNm: first.wavelengthNm,
    reading: { method: 'tardy', lowerOrder: 0, analyzerRotationDeg: 19, movedFringe: 'lower' },
    sign: first.sign,
    reason: 'Analyzer read against the wrong index mark; re-read 19° at the same setting.',
  });
}
