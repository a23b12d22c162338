import { parse } from 'csv-parse/sync';
import { describe, expect, it } from 'vitest';
import type { Client } from '../support/client.ts';
import { factoriesFor } from '../support/factories.ts';
import { inLab } from '../support/inLab.ts';
import { csvOf, modelWithSites, postCsv } from './readingTransferFixtures.ts';

const rowsOf = (csv: string) => parse(csv, { columns: true }) as Record<string, string>[];
const ordersBySiteAndTime = (rows: { site: string; at: string; order: number }[]) =>
  Object.fromEntries(rows.map((r) => [`${r.site}|${r.at}`, r.order]));

/** Readings of every method at two sites of model UN-07, one of them amended. */
async function recordedLab(technician: Client, make: ReturnType<typeof factoriesFor>) {
  const { sites } = await modelWithSites(make, 'UN-07', ['upper notch root', 'lower notch root']);
  const upper = sites['upper notch root']!.id;
  const lower = sites['lower notch root']!.id;
  const base = { operator: 'R. Okafor', wavelengthNm: 577 };
  const original = await make.reading(upper, { ...base, stage: 'before_load', observedAt: '2026-11-21T14:01:00Z', reading: { method: 'tardy', lowerOrder: 0, analyzerRotationDeg: 27, movedFringe: 'lower' } });
  await make.reading(upper, { ...base, stage: 'under_load', loadN: 450, observedAt: '2026-11-21T14:02:00Z', reading: { method: 'senarmont', wholeOrder: 2, analyzerRotationDeg: 36 }, sign: 'positive', uncertaintyFringes: 0.03, notes: 'edge, "bright" band' });
  await make.reading(lower, { ...base, wavelengthNm: null, stage: 'after_unload', observedAt: '2026-11-21T14:03:00Z', reading: { method: 'tardy', lowerOrder: 1, analyzerRotationDeg: 54, movedFringe: 'upper' } });
  await make.reading(lower, { ...base, stage: 'after_anneal', observedAt: '2026-11-21T14:04:00Z', reading: { method: 'compensator', retardationNm: 1154 } });
  await make.reading(lower, { ...base, stage: 'inspection', observedAt: '2026-11-21T14:05:00Z', reading: { method: 'direct', fringeOrder: 0.8 } });
  await make.reading(lower, { ...base, stage: 'inspection', observedAt: '2026-11-21T14:06:00Z', reading: { method: 'whole_order', wholeOrder: 3 } });
  const amended = await technician.post(`/v1/readings/${original.id}/amendments`, {
    ...base,
    stage: 'before_load',
    observedAt: '2026-11-21T14:01:00Z',
    reading: { method: 'tardy', lowerOrder: 0, analyzerRotationDeg: 72, movedFringe: 'lower' },
    reason: 'analyzer angle misread',
  });
  expect(amended.status).toBe(201);
  return { sites, original, amended: amended.body };
}

describe('exporting readings', () => {
  it('writes a CSV attachment in the import columns with the derived values, current readings only', () =>
    inLab(async ({ technician, viewer, make }) => {
      const { original, amended } = await recordedLab(technician, make);
      const reply = await viewer.get('/v1/readings/export?format=csv');
      expect(reply.status, reply.text).toBe(200);
      expect(reply.headers.get('content-type')).toContain('text/csv');
      expect(reply.headers.get('content-disposition')).toMatch(/^attachment; filename="fringe-readings-\d{4}-\d{2}-\d{2}\.csv"$/);
      const rows = rowsOf(reply.text);
      expect(rows).toHaveLength(6);
      expect(rows.map((r) => r.id)).not.toContain(original.id);
      const correction = rows.find((r) => r.id === amended.id)!;
      // Tardy N = n + β/180 = 72/180 = 0.4, from memory [M] (Dally & Riley); δ = N·λ (common practice).
      expect(correction).toMatchObject({ model_code: 'UN-07', site_label: 'upper notch root', method: 'tardy', lower_order: '0', analyzer_rotation_deg: '72', moved_fringe: 'lower', supersedes_id: original.id, amendment_reason: 'analyzer angle misread' });
      expect(Number(correction.fringe_order)).toBeCloseTo(0.4, 12);
      expect(Number(correction.retardation_nm)).toBeCloseTo(0.4 * 577, 9);
      const loaded = rows.find((r) => r.stage === 'under_load')!;
      expect(loaded).toMatchObject({ load_n: '450', uncertainty_fringes: '0.03', notes: 'edge, "bright" band', sign: 'positive', whole_order: '2' });
      expect(rows.find((r) => r.stage === 'after_unload')!.wavelength_nm).toBe('');
    }));

  it('includes superseded readings only when asked', () =>
    inLab(async ({ technician, viewer, make }) => {
      const { original } = await recordedLab(technician, make);
      const all = rowsOf((await viewer.get('/v1/readings/export?includeSuperseded=true')).text);
      expect(all).toHaveLength(7);
      expect(all.find((r) => r.id === original.id)).toMatchObject({ analyzer_rotation_deg: '27', supersedes_id: '' });
    }));

  it('filters by site, model, stage and observation time', () =>
    inLab(async ({ technician, viewer, make }) => {
      const { sites } = await recordedLab(technician, make);
      const count = async (query: string) => rowsOf((await viewer.get(`/v1/readings/export?${query}`)).text).length;
      expect(await count(`siteId=${sites['lower notch root']!.id}`)).toBe(4);
      expect(await count('stage=inspection')).toBe(2);
      expect(await count('from=2026-11-21T14:03:00Z&to=2026-11-21T14:05:00Z')).toBe(2);
      const elsewhere = await make.model();
      expect(await count(`modelId=${elsewhere.id}`)).toBe(0);
      expect((await viewer.get('/v1/readings/export?stage=sideways')).status).toBe(422);
    }));

  it('round-trips CSV and JSON into another lab with the same model codes and site labels', () =>
    inLab(async ({ technician, viewer, make, otherLab }) => {
      await recordedLab(technician, make);
      const csv = (await viewer.get('/v1/readings/export?format=csv')).text;
      const json = await viewer.get('/v1/readings/export?format=json');
      expect(json.headers.get('content-type')).toContain('application/json');
      expect(json.body.readings).toHaveLength(6);

      const here = ordersBySiteAndTime(rowsOf(csv).map((r) => ({ site: r.site_label!, at: r.observed_at!, order: Number(r.fringe_order) })));
      for (const [format, send] of [
        ['csv', (c: Client) => postCsv(c, csv)],
        ['json', (c: Client) => c.post('/v1/readings/import', json.body)],
      ] as const) {
        const other = await otherLab();
        await modelWithSites(factoriesFor(other.admin), 'UN-07', ['upper notch root', 'lower notch root']);
        const imported = await send(other.admin);
        expect(imported.status, `${format}: ${imported.text}`).toBe(201);
        expect(imported.body.rowCount).toBe(6);
        const back = rowsOf((await other.admin.get('/v1/readings/export')).text);
        const there = ordersBySiteAndTime(back.map((r) => ({ site: r.site_label!, at: r.observed_at!, order: Number(r.fringe_order) })));
        expect(there, format).toEqual(here);
        expect(back.every((r) => r.supersedes_id === '')).toBe(true);
      }
    }));

  it('round-trips superseded readings with their amendments when the export includes them', () =>
    inLab(async ({ technician, viewer, make, otherLab }) => {
      const { original, amended } = await recordedLab(technician, make);
      const csv = (await viewer.get('/v1/readings/export?format=csv&includeSuperseded=true')).text;
      const json = (await viewer.get('/v1/readings/export?format=json&includeSuperseded=true')).body;
      expect(json.readings).toHaveLength(7);
      for (const [format, send] of [
        ['csv', (c: Client) => postCsv(c, csv)],
        ['json', (c: Client) => c.post('/v1/readings/import', json)],
      ] as const) {
        const other = await otherLab();
        const { sites } = await modelWithSites(factoriesFor(other.admin), 'UN-07', ['upper notch root', 'lower notch root']);
        const imported = await send(other.admin);
        expect(imported.status, `${format}: ${imported.text}`).toBe(201);
        expect(imported.body.rowCount).toBe(7);
        const back = rowsOf((await other.admin.get('/v1/readings/export?includeSuperseded=true')).text);
        const correction = back.find((r) => r.analyzer_rotation_deg === '72')!;
        const first = back.find((r) => r.analyzer_rotation_deg === '27')!;
        expect(correction, format).toMatchObject({ supersedes_id: first.id, amendment_reason: 'analyzer angle misread', site_label: 'upper notch root' });
        expect([first.id, correction.id]).not.toContain(original.id);
        expect(correction.id).not.toBe(amended.id);
        // The amendment replaces the first reading among the current ones, as in the lab it came from.
        const current = (await other.admin.get(`/v1/sites/${sites['upper notch root']!.id}/readings`)).body.items.map((r: { id: string }) => r.id);
        expect(current, format).toHaveLength(2);
        expect(current, format).toContain(correction.id);
        expect(current, format).not.toContain(first.id);
      }
    }));

  it('pages through a lab larger than one page without losing or repeating a row', () =>
    inLab(async ({ technician, viewer, make }) => {
      await modelWithSites(make, 'UN-09', ['edge']);
      const lines = Array.from({ length: 2300 }, (_, i) => `UN-09,edge,before_load,2026-11-21T14:05:00Z,R. Okafor,577,whole_order,${i % 9},row ${i}`);
      expect((await postCsv(technician, csvOf(['model_code,site_label,stage,observed_at,operator,wavelength_nm,method,whole_order,notes', ...lines]))).status).toBe(201);
      const rows = rowsOf((await viewer.get('/v1/readings/export')).text);
      expect(rows).toHaveLength(2300);
      expect(new Set(rows.map((r) => r.id)).size).toBe(2300);
      expect(new Set(rows.map((r) => r.notes)).size).toBe(2300);
    }));

  it('answers an empty lab with just the header, or an empty JSON list', () =>
    inLab(async ({ viewer }) => {
      const csv = await viewer.get('/v1/readings/export');
      expect(csv.text.split('\n')[0]).toMatch(/^id,model_code,site_label,stage,load_n,observed_at/);
      expect(rowsOf(csv.text)).toHaveLength(0);
      expect((await viewer.get('/v1/readings/export?format=json')).body).toEqual({ readings: [] });
    }));
});
