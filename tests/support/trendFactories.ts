import type { Client } from './client.ts';
import type { Factories } from './factories.ts';

const HOUR_MS = 3_600_000;
const FRINGE_VALUE_N_PER_MM = 7;
export const TREND_T0 = Date.parse('2026-10-05T08:00:00Z');

/** One current reading as the lab was built, with what the trend queries should compute from it. */
export interface BuiltReading {
  batchCode: string;
  modelId: string;
  siteId: string;
  siteKind: string;
  operator: string;
  machiningMethod: string;
  observedAt: string;
  order577: number;
  stressMPa: number;
}

async function posted(client: Client, path: string, body: unknown) {
  const reply = await client.post(path, body);
  if (reply.status !== 201) throw new Error(`POST ${path} answered ${reply.status}: ${reply.text}`);
  return reply.body;
}

// Invented residuals: batch "bad" sits well above the 0.2-fringe limit, batch "good" well below.
const GOOD = [0.05, 0.07, 0.06, 0.09, 0.08, 0.04, 0.1, 0.06, 0.07, 0.05, 0.08, 0.09, 0.06, 0.07, 0.05, 0.08];
const BAD = [0.22, 0.31, 0.18, 0.27, 0.35, 0.24, 0.29, 0.21, 0.26, 0.33, 0.19, 0.28, 0.25, 0.3, 0.23, 0.27];
const OPERATORS = ['A. Ahn', 'B. Berg'];
const METHODS = { good: ['milling', 'milling', 'fly cutting', 'fly cutting'], bad: ['band sawing', 'band sawing', 'milling', 'milling'] };

/**
 * A small lab: one polycarbonate material (fσ 7 N/mm at 577 nm), a good and a bad batch of four
 * models each, two notch-root sites a model (one 5.8 mm thick locally), a machining event per
 * model and two before-load readings per site on two days. One reading of the good batch is
 * taken at 546 nm, and one of the bad batch is amended, so that reduction to 577 nm and
 * "current readings only" are both exercised.
 */
export async function buildTrendLab(admin: Client, make: Factories) {
  const material = await make.material({ fringeValueNPerMm: FRINGE_VALUE_N_PER_MM, fringeValueWavelengthNm: 577 });
  const built: BuiltReading[] = [];
  const batches: Record<'good' | 'bad', string> = { good: '', bad: '' };
  for (const quality of ['good', 'bad'] as const) {
    const batch = await make.batch({ materialId: material.id });
    batches[quality] = batch.code;
    const values = quality === 'good' ? GOOD : BAD;
    for (let m = 0; m < 4; m++) {
      const model = await make.model({ batchId: batch.id, thicknessMm: 6 });
      const machiningMethod = METHODS[quality][m]!;
      const machinedAt = TREND_T0 + (quality === 'good' ? 0 : 12 * HOUR_MS) + m * 24 * HOUR_MS;
      await posted(admin, `/v1/models/${model.id}/events`, { kind: 'machined', occurredAt: new Date(machinedAt).toISOString(), operator: 'C. Cruz', machiningMethod });
      const sites = [
        await make.site({ modelId: model.id, label: 'upper notch root' }),
        await make.site({ modelId: model.id, label: 'lower notch root', localThicknessMm: 5.8 }),
      ];
      for (let s = 0; s < 2; s++) {
        for (let day = 0; day < 2; day++) {
          const order = values[m * 4 + s * 2 + day]!;
          const observedAt = new Date(machinedAt + (2 + day * 24) * HOUR_MS).toISOString();
          const operator = OPERATORS[(m + day) % 2]!;
          const at546 = quality === 'good' && m === 0 && s === 0 && day === 0;
          const slip = quality === 'bad' && m === 1 && s === 1 && day === 1;
          const reading = await make.reading(sites[s]!.id, {
            observedAt,
            operator,
            wavelengthNm: at546 ? 546 : 577,
            reading: { method: 'direct', fringeOrder: slip ? order + 0.5 : order },
          });
          if (slip) {
            // A copying slip, corrected by an amendment: only the amendment is current.
            await posted(admin, `/v1/readings/${reading.id}/amendments`, {
              stage: 'before_load', observedAt, operator, wavelengthNm: 577, reading: { method: 'direct', fringeOrder: order }, reason: 'decimal slip in the notebook',
            });
          }
          built.push(entry(batch.code, model.id, sites[s]!, operator, machiningMethod, observedAt, at546 ? (order * 546) / 577 : order));
        }
      }
    }
  }
  return { material, batches, readings: built };
}

function entry(batchCode: string, modelId: string, site: { id: string; kind: string; localThicknessMm: number | null }, operator: string, machiningMethod: string, observedAt: string, order577: number): BuiltReading {
  const thicknessMm = site.localThicknessMm ?? 6;
  return { batchCode, modelId, siteId: site.id, siteKind: site.kind, operator, machiningMethod, observedAt, order577, stressMPa: (order577 * FRINGE_VALUE_N_PER_MM) / thicknessMm };
}

/**
 * Models with a machined-edge site read at inspection at the given hours after machining, on
 * the curve orders(h). Each model is machined at TREND_T0 and then stored.
 */
export async function buildAgingModels(admin: Client, make: Factories, batchId: string, plan: { hours: number[]; orderAt: (h: number) => number }[]) {
  const built: { modelId: string; modelCode: string }[] = [];
  for (const { hours, orderAt } of plan) {
    const model = await make.model({ batchId });
    await posted(admin, `/v1/models/${model.id}/events`, { kind: 'machined', occurredAt: new Date(TREND_T0).toISOString(), operator: 'C. Cruz', machiningMethod: 'milling' });
    await posted(admin, `/v1/models/${model.id}/events`, { kind: 'stored', occurredAt: new Date(TREND_T0 + HOUR_MS).toISOString(), operator: 'C. Cruz', temperatureC: 23, relativeHumidityPct: 50 });
    const site = await make.site({ modelId: model.id, label: 'sawn edge', kind: 'machined_edge' });
    for (const h of hours) {
      await make.reading(site.id, { stage: 'inspection', observedAt: new Date(TREND_T0 + h * HOUR_MS).toISOString(), reading: { method: 'direct', fringeOrder: orderAt(h) } });
    }
    built.push({ modelId: model.id, modelCode: model.code });
  }
  return built;
}
