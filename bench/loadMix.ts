import type { Client } from '../tests/support/client.ts';

export interface MixTargets {
  modelId: string;
  siteId: string;
  readingId: string;
  siteIds: string[];
}

/** Ids of the demo lab's records to aim the reads and writes at. */
export async function mixTargets(viewer: Client): Promise<MixTargets> {
  const models = (await viewer.get('/v1/models?limit=50')).body.items as { id: string }[];
  const siteIds: string[] = [];
  for (const model of models.slice(0, 6)) for (const site of (await viewer.get(`/v1/models/${model.id}/sites`)).body as { id: string }[]) siteIds.push(site.id);
  const siteId = siteIds[0]!;
  const readings = (await viewer.get(`/v1/sites/${siteId}/readings`)).body.items as { id: string }[];
  if (!models[0] || !readings[0]) throw new Error('the load needs the demo lab (LOAD_DEMO=auto on a fresh database)');
  return { modelId: models[0].id, siteId, readingId: readings[0].id, siteIds };
}

/**
 * One cycle of the mix, in the proportions a lab's day has: nine reads (lists, one reading,
 * the residual analysis of a model, a trend) for every reading recorded.
 */
export function mixCycle(t: MixTargets, viewerKey: string, technicianKey: string) {
  const read = (path: string) => ({ method: 'GET', path, headers: { authorization: `Bearer ${viewerKey}` } });
  const reading = { stage: 'inspection', observedAt: '2026-11-21T14:05:00Z', operator: 'load bench', wavelengthNm: 577, reading: { method: 'direct', fringeOrder: 0.08 } };
  return [
    read('/v1/models?limit=50'),
    read(`/v1/sites/${t.siteId}/readings`),
    read(`/v1/readings/${t.readingId}`),
    read(`/v1/models/${t.modelId}/sites`),
    read(`/v1/models/${t.modelId}/residual-analysis`),
    read('/v1/trends/residuals?groupBy=batch'),
    read(`/v1/models/${t.modelId}`),
    read('/v1/whoami'),
    read(`/v1/sites/${t.siteIds[1] ?? t.siteId}/readings?limit=20`),
    { method: 'POST', path: `/v1/sites/${t.siteId}/readings`, headers: { authorization: `Bearer ${technicianKey}`, 'content-type': 'application/json' }, body: JSON.stringify(reading) },
  ];
}

/** A small import file (a morning's readings from one bench), different each time. */
export function importFile(siteIds: string[], n: number, rows = 200): string {
  const t0 = Date.parse('2026-06-01T08:00:00Z') + n * 86_400_000;
  const lines = ['site_id,stage,observed_at,operator,wavelength_nm,method,fringe_order'];
  for (let i = 0; i < rows; i++) lines.push(`${siteIds[i % siteIds.length]},inspection,${new Date(t0 + i * 60_000).toISOString()},load bench,577,direct,${((i % 20) / 100).toFixed(2)}`);
  return `${lines.join('\n')}\n`;
}
