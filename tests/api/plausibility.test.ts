import { count } from 'drizzle-orm';
import { describe, expect, it } from 'vitest';
import { readings } from '../../db/schema/index.ts';
import { annealingModel, importOvenLog } from '../support/annealingHelpers.ts';
import { inLab, type LabContext } from '../support/inLab.ts';

const direct = (fringeOrder: number) => ({ method: 'direct', fringeOrder });
const readingCount = async (lab: LabContext) => (await lab.db.select({ n: count() }).from(readings))[0]!.n;

// Polycarbonate at fσ 7 N/mm (577 nm), 6 mm thick: 180 MPa × 6 / 7 = 154.29 fringes at most.
async function polycarbonateSite(lab: LabContext, siteThicknessMm?: number) {
  const material = await lab.make.material({ family: 'polycarbonate', fringeValueNPerMm: 7, fringeValueWavelengthNm: 577 });
  const batch = await lab.make.batch({ materialId: material.id });
  const model = await lab.make.model({ batchId: batch.id, thicknessMm: 6 });
  return lab.make.site({ modelId: model.id, ...(siteThicknessMm ? { localThicknessMm: siteThicknessMm } : {}) });
}

describe('values that parse but cannot be right', () => {
  it('refuses a fringe order above what the model could carry, saying which limit and why', () =>
    inLab(async (lab) => {
      const site = await polycarbonateSite(lab);
      const before = await readingCount(lab);
      const reply = await lab.technician.post(`/v1/sites/${site.id}/readings`, { stage: 'before_load', observedAt: '2026-11-21T14:05:00Z', operator: 'A. Ahn', wavelengthNm: 577, reading: direct(180) });
      expect(reply.status).toBe(422);
      expect(reply.body.code).toBe('implausible_value');
      expect(reply.body.errors[0]).toMatchObject({ field: 'reading' });
      expect(reply.body.errors[0].message).toMatch(/fringe order 180 .*at most 154\.29 fringes: 180 MPa \(a generous maximum stress for polycarbonate\) × 6 mm \/ fσ 7 N\/mm at 577 nm/);
      expect(await readingCount(lab)).toBe(before);
      expect((await lab.technician.post(`/v1/sites/${site.id}/readings`, { stage: 'before_load', observedAt: '2026-11-21T14:05:00Z', operator: 'A. Ahn', wavelengthNm: 577, reading: direct(150) })).status).toBe(201);
    }));

  it('uses the site thickness and the reading wavelength, and checks amendments and imports too', () =>
    inLab(async (lab) => {
      const site = await polycarbonateSite(lab, 2);
      // 2 mm: 180 × 2 / 7 = 51.43 at 577 nm; at 435.8 nm fσ is 5.287 N/mm, so 68.09.
      const at = (wavelengthNm: number, order: number) => ({ stage: 'before_load', observedAt: '2026-11-21T14:05:00Z', operator: 'A. Ahn', wavelengthNm, reading: direct(order) });
      expect((await lab.technician.post(`/v1/sites/${site.id}/readings`, at(577, 60))).body.code).toBe('implausible_value');
      const ok = await lab.technician.post(`/v1/sites/${site.id}/readings`, at(435.8, 60));
      expect(ok.status).toBe(201);
      const amended = await lab.technician.post(`/v1/readings/${ok.body.id}/amendments`, { ...at(577, 60), reason: 'wavelength misread' });
      expect(amended.status).toBe(422);
      expect(amended.body.code).toBe('implausible_value');
      const row = (minute: number, order: number) => `${site.id},before_load,2026-11-21T15:${minute}:00Z,A. Ahn,577,direct,${order}\n`;
      const csv = `site_id,stage,observed_at,operator,wavelength_nm,method,fringe_order\n${row(10, 0.4)}${row(20, 40)}${row(30, 100)}`;
      const before = await readingCount(lab);
      const imported = await lab.technician.send('POST', '/v1/readings/import', { body: csv, headers: { 'content-type': 'text/csv' } });
      expect(imported.status, imported.text).toBe(422);
      expect(imported.body.code).toBe('implausible_value');
      expect(imported.body.errors).toHaveLength(1);
      expect(imported.body.errors[0]).toMatchObject({ row: 4 });
      expect(await readingCount(lab)).toBe(before);
    }));

  it('refuses a wavelength outside the visible range', () =>
    inLab(async (lab) => {
      const site = await polycarbonateSite(lab);
      const reply = await lab.technician.post(`/v1/sites/${site.id}/readings`, { stage: 'before_load', observedAt: '2026-11-21T14:05:00Z', operator: 'A. Ahn', wavelengthNm: 1064, reading: direct(1) });
      expect(reply.status).toBe(422);
    }));

  it('answers an oven log that runs backwards in time with 422, naming the row', () =>
    inLab(async (lab) => {
      const { model } = await annealingModel(lab.make, 'cast_acrylic', 6);
      const plan = await lab.technician.post(`/v1/models/${model.id}/annealing-plans`, {});
      const run = await lab.technician.post('/v1/annealing/runs', { planId: plan.body.id, ovenName: 'Oven 1', modelIds: [model.id], operator: 'T. Haddad', startedAt: '2026-11-24T07:30:00Z' });
      const reply = await importOvenLog(lab.technician, run.body.id, 'elapsed_h,temperature_c\n0,22\n0.5,30\n1.0,38\n0.8,40\n1.5,45\n');
      expect(reply.status).toBe(422);
      expect(reply.body.errors).toContainEqual(expect.objectContaining({ row: 5, message: expect.stringMatching(/backwards/) }));
    }));
});
