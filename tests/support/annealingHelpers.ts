import type { PlanSegment } from '../../src/annealing/AnnealingPlan.ts';
import { syntheticOvenLog } from '../src/annealing/syntheticOvenLog.ts';
import type { Client, Reply } from './client.ts';
import type { Factories } from './factories.ts';

/** A model of the given material family and thickness, on a material and batch of its own. */
export async function annealingModel(make: Factories, family: string, thicknessMm: number) {
  const material = await make.material({ family, ...(family === 'cast_acrylic' ? { fringeValueNPerMm: 130, fringeValueUncertaintyNPerMm: 15 } : {}) });
  const batch = await make.batch({ materialId: material.id });
  return { material, model: await make.model({ batchId: batch.id, thicknessMm }) };
}

/** An oven log CSV that follows the plan (with noise and an optional planted fault). */
export function ovenLogCsv(segments: PlanSegment[], options: Parameters<typeof syntheticOvenLog>[1]): string {
  const rows = syntheticOvenLog(segments, options).map((s) => `${s.elapsedH!.toFixed(4)},${s.temperatureC.toFixed(2)}`);
  return ['elapsed_h,temperature_c', ...rows].join('\n') + '\n';
}

export function importOvenLog(client: Client, runId: string, csv: string, query = ''): Promise<Reply> {
  return client.send('POST', `/v1/annealing/runs/${runId}/oven-logs/import${query}`, { body: csv, headers: { 'content-type': 'text/csv' } });
}

/** Tardy reading of N = β/180 (lower fringe 0 moved to the point by β degrees). */
export const tardyOrder = (order: number) => ({ method: 'tardy', lowerOrder: 0, analyzerRotationDeg: order * 180, movedFringe: 'lower' });

export const hoursAfter = (iso: string, hours: number) => new Date(Date.parse(iso) + hours * 3_600_000).toISOString();
