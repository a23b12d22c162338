import { describe, expect, it } from 'vitest';
import { inLab } from '../support/inLab.ts';
import { modelWithSites, postCsv } from './readingTransferFixtures.ts';

const colourReading = (colour: Record<string, unknown>) => ({
  stage: 'before_load',
  observedAt: '2026-11-21T14:05:00Z',
  operator: 'T. Haddad',
  wavelengthNm: null,
  reading: { method: 'white_light_colour', ...colour },
});

describe('white-light colour readings in CSV files', () => {
  it('exports the colour inputs and re-imports them into another lab with the same fringe orders', () =>
    inLab(async ({ admin, technician, make, otherLab }) => {
      const { sites } = await modelWithSites(make, 'COL-1', ['upper notch root']);
      const site = sites['upper notch root']!;
      for (const colour of [{ srgbHex: '#2b35c9' }, { namedColour: 'deep blue' }, { retardationNm: 460 }]) {
        expect((await technician.post(`/v1/sites/${site.id}/readings`, colourReading(colour))).status).toBe(201);
      }
      const csv = await admin.get('/v1/readings/export?format=csv');
      expect(csv.text.split('\n')[0]).toContain('srgb_hex,named_colour,illuminant');

      const other = await otherLab();
      const model = await other.admin.post('/v1/models', {
        batchId: (await other.admin.post('/v1/batches', { materialId: (await other.admin.get('/v1/materials')).body.items[0].id, code: 'B', kind: 'sheet_lot' })).body.id,
        code: 'COL-1', geometryKind: 'other', thicknessMm: 6,
      });
      await other.admin.post(`/v1/models/${model.body.id}/sites`, { label: 'upper notch root', kind: 'notch_root', onFreeEdge: true });
      const imported = await postCsv(other.admin, csv.text);
      expect(imported.status, imported.text).toBe(201);
      expect(imported.body.rowCount).toBe(3);

      const summary = (r: { fringeOrder: number; reading: Record<string, unknown> }) => `${r.reading.method}:${JSON.stringify(r.reading)}:${r.fringeOrder}`;
      const back = (await other.admin.get('/v1/readings/export?format=json')).body.readings.map(summary).sort();
      const original = (await admin.get('/v1/readings/export?format=json')).body.readings.map(summary).sort();
      expect(original).toHaveLength(3);
      expect(back).toEqual(original);
    }));
});
