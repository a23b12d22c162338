import { describe, expect, it } from 'vitest';
import { inLab } from '../support/inLab.ts';

describe('fringe readings', () => {
  it('stores the raw inputs and derives the fringe order (Tardy: N = n + β/180)', () =>
    inLab(async ({ technician, make }) => {
      const site = await make.site();
      const reply = await technician.post(`/v1/sites/${site.id}/readings`, {
        stage: 'before_load',
        observedAt: '2026-11-21T14:05:00Z',
        operator: 'R. Okafor',
        wavelengthNm: 577,
        reading: { method: 'tardy', lowerOrder: 1, analyzerRotationDeg: 45, movedFringe: 'lower' },
        sign: 'positive',
      });
      expect(reply.status).toBe(201);
      expect(reply.body.rawInputs).toMatchObject({ method: 'tardy', lowerOrder: 1, analyzerRotationDeg: 45, movedFringe: 'lower' });
      expect(reply.body.fringeOrder).toBeCloseTo(1.25, 10);
      expect(reply.body.retardationNm).toBeCloseTo(1.25 * 577, 6);
      expect(reply.body.fringeOrderUncertainty).toBeGreaterThan(0);
    }));

  it('needs a load for a reading under load, and refuses one elsewhere', () =>
    inLab(async ({ technician, make }) => {
      const site = await make.site();
      const base = { observedAt: '2026-11-21T14:05:00Z', operator: 'R. Okafor', wavelengthNm: 577, reading: { method: 'whole_order', wholeOrder: 3 } };
      expect((await technician.post(`/v1/sites/${site.id}/readings`, { ...base, stage: 'under_load' })).status).toBe(422);
      expect((await technician.post(`/v1/sites/${site.id}/readings`, { ...base, stage: 'before_load', loadN: 500 })).status).toBe(422);
      expect((await technician.post(`/v1/sites/${site.id}/readings`, { ...base, stage: 'under_load', loadN: 500 })).status).toBe(201);
    }));

  it('amends a reading by superseding it; both stay readable and only one amendment wins', () =>
    inLab(async ({ technician, viewer, make }) => {
      const site = await make.site();
      const original = await make.reading(site.id, { reading: { method: 'tardy', lowerOrder: 0, analyzerRotationDeg: 27, movedFringe: 'lower' } });
      const amendment = {
        stage: 'before_load',
        observedAt: original.observedAt,
        operator: 'R. Okafor',
        wavelengthNm: 577,
        reading: { method: 'tardy', lowerOrder: 0, analyzerRotationDeg: 72, movedFringe: 'lower' },
        reason: 'analyzer angle misread',
      };
      const amended = await technician.post(`/v1/readings/${original.id}/amendments`, amendment);
      expect(amended.status).toBe(201);
      expect(amended.body.supersedesId).toBe(original.id);
      expect(amended.body.fringeOrder).toBeCloseTo(0.4, 10);

      const old = await viewer.get(`/v1/readings/${original.id}`);
      expect(old.body.fringeOrder).toBeCloseTo(0.15, 10);
      expect(old.body.supersededById).toBe(amended.body.id);

      const again = await technician.post(`/v1/readings/${original.id}/amendments`, amendment);
      expect(again.status).toBe(409);

      const current = await viewer.get(`/v1/sites/${site.id}/readings`);
      expect(current.body.items.map((r: { id: string }) => r.id)).toEqual([amended.body.id]);
      const all = await viewer.get(`/v1/sites/${site.id}/readings?includeSuperseded=true`);
      expect(all.body.items).toHaveLength(2);
    }));

  it('refuses to edit or delete a stored reading even through SQL', () =>
    inLab(async ({ db, make }) => {
      const site = await make.site();
      const reading = await make.reading(site.id);
      const { readings } = await import('../../db/schema/index.ts');
      const { eq } = await import('drizzle-orm');
      await expect(db.transaction((tx) => tx.update(readings).set({ fringeOrder: 0 }).where(eq(readings.id, reading.id)))).rejects.toThrow();
      await expect(db.transaction((tx) => tx.delete(readings).where(eq(readings.id, reading.id)))).rejects.toThrow();
    }));

  it('answers malformed JSON with 400 and wrong types with 422, as problem+json', () =>
    inLab(async ({ technician, make }) => {
      const site = await make.site();
      const broken = await technician.send('POST', `/v1/sites/${site.id}/readings`, { body: '{"stage":', headers: { 'content-type': 'application/json' } });
      expect(broken.status).toBe(400);
      expect(broken.headers.get('content-type')).toContain('application/problem+json');
      const wrong = await technician.post(`/v1/sites/${site.id}/readings`, { stage: 'before_load', observedAt: 'yesterday', operator: 5, wavelengthNm: 1200, reading: { method: 'tardy' } });
      expect(wrong.status).toBe(422);
      const fields = wrong.body.errors.map((e: { field: string }) => e.field);
      expect(fields).toEqual(expect.arrayContaining(['json.observedAt', 'json.operator', 'json.wavelengthNm']));
    }));
});
