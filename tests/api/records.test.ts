import { describe, expect, it } from 'vitest';
import { inLab } from '../support/inLab.ts';

describe('model records', () => {
  it('records a material, batch, model, site and timeline, and reports time since machining', () =>
    inLab(async ({ admin, technician, make }) => {
      const model = await make.model({ thicknessMm: 6.05 });
      const site = await technician.post(`/v1/models/${model.id}/sites`, { label: 'upper notch root', kind: 'notch_root', onFreeEdge: true });
      expect(site.status).toBe(201);
      const machinedAt = new Date(Date.now() - 48 * 3_600_000).toISOString();
      const event = await technician.post(`/v1/models/${model.id}/events`, { kind: 'machined', occurredAt: machinedAt, operator: 'A. Tester', machiningMethod: 'milling', tool: '6 mm end mill' });
      expect(event.status).toBe(201);
      const stored = await technician.post(`/v1/models/${model.id}/events`, { kind: 'stored', occurredAt: new Date().toISOString(), operator: 'A. Tester', temperatureC: 23, relativeHumidityPct: 45 });
      expect(stored.status).toBe(201);

      const detail = await admin.get(`/v1/models/${model.id}`);
      expect(detail.status).toBe(200);
      expect(detail.body.model.thicknessMm).toBe(6.05);
      expect(detail.body.sites.map((s: { label: string }) => s.label)).toEqual(['upper notch root']);
      expect(detail.body.timeline.map((e: { kind: string }) => e.kind)).toEqual(['machined', 'stored']);
      expect(detail.body.derived.lastMachiningMethod).toBe('milling');
      expect(detail.body.derived.hoursSinceMachining).toBeGreaterThan(47.9);
      expect(detail.body.derived.hoursSinceMachining).toBeLessThan(48.5);
      expect(detail.body.derived.storage).toMatchObject({ temperatureC: 23, relativeHumidityPct: 45 });
    }));

  it('refuses a machining event without its method, and writes nothing', () =>
    inLab(async ({ technician, make }) => {
      const model = await make.model();
      const reply = await technician.post(`/v1/models/${model.id}/events`, { kind: 'machined', occurredAt: '2026-11-01T10:00:00Z', operator: 'A. Tester' });
      expect(reply.status).toBe(422);
      expect(reply.headers.get('content-type')).toContain('application/problem+json');
      expect(reply.body.errors[0].field).toBe('json.machiningMethod');
      const events = await technician.get(`/v1/models/${model.id}/events`);
      expect(events.body.items).toEqual([]);
    }));

  it('pages through a list with a cursor and caps the page size', () =>
    inLab(async ({ admin, make }) => {
      const batch = await make.batch();
      for (let i = 0; i < 5; i++) await make.model({ batchId: batch.id });
      const first = await admin.get(`/v1/models?batchId=${batch.id}&limit=2`);
      expect(first.body.items).toHaveLength(2);
      const second = await admin.get(`/v1/models?batchId=${batch.id}&limit=2&cursor=${first.body.nextCursor}`);
      const third = await admin.get(`/v1/models?batchId=${batch.id}&limit=2&cursor=${second.body.nextCursor}`);
      expect(third.body.items).toHaveLength(1);
      expect(third.body.nextCursor).toBeNull();
      const ids = [...first.body.items, ...second.body.items, ...third.body.items].map((m: { id: string }) => m.id);
      expect(new Set(ids).size).toBe(5);
      expect((await admin.get('/v1/models?limit=201')).status).toBe(422);
      expect((await admin.get('/v1/models?cursor=not-a-cursor')).status).toBe(422);
    }));

  it('keeps one lab\'s records invisible to another lab', () =>
    inLab(async ({ make, otherLab }) => {
      const model = await make.model();
      const other = await otherLab();
      expect((await other.admin.get(`/v1/models/${model.id}`)).status).toBe(404);
      expect((await other.admin.post(`/v1/models/${model.id}/sites`, { label: 'x', kind: 'notch_root', onFreeEdge: true })).status).toBe(404);
      const list = await other.admin.get('/v1/models');
      expect(list.body.items.map((m: { id: string }) => m.id)).not.toContain(model.id);
    }));

  it('rejects physically impossible values in the database itself, past the API', () =>
    inLab(async ({ db, labId, make }) => {
      const batch = await make.batch();
      const { models } = await import('../../db/schema/index.ts');
      await expect(
        db.transaction((tx) => tx.insert(models).values({ labId, batchId: batch.id, code: 'bad', geometryKind: 'other', thicknessMm: -1, thicknessUncertaintyMm: 0 })),
      ).rejects.toThrow();
    }));
});
