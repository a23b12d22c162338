import { parse } from 'csv-parse/sync';
import { describe, expect, it } from 'vitest';
import { ANNEALING_CAUTIONS, ANNEALING_GUIDANCE_CATALOGUE } from '../../src/annealing/guidanceCatalogue.ts';
import { annealingModel } from '../support/annealingHelpers.ts';
import { inLab } from '../support/inLab.ts';

describe('annealing plans', () => {
  it('generates and stores a plan for a 6 mm cast acrylic model from the published default, with cautions', () =>
    inLab(async ({ technician, viewer, make }) => {
      const { model } = await annealingModel(make, 'cast_acrylic', 6);
      const reply = await technician.post(`/v1/models/${model.id}/annealing-plans`, {});
      expect(reply.status).toBe(201);
      expect(reply.body).toMatchObject({ modelId: model.id, guidanceKey: 'cast-acrylic-sheet.maker-guidance', catalogueVersion: ANNEALING_GUIDANCE_CATALOGUE.version, chosenBy: 'published_default', thicknessSource: 'model', maxSectionThicknessMm: 6 });
      // The same plan the domain core documents for 6 mm (its worked example): 23→80 °C at 30 °C/h, 6 h soak, 80→49 °C.
      expect(reply.body.plan.segments.map((s: { kind: string; endTemperatureC: number; rateCPerH: number | null }) => [s.kind, s.endTemperatureC, s.rateCPerH])).toEqual([['ramp', 80, 30], ['soak', 80, null], ['ramp', 49, 30]]);
      expect(reply.body.totalDurationH).toBeCloseTo(8.933, 3);
      expect(reply.body.cautions).toEqual([...ANNEALING_CAUTIONS]);
      const stored = await viewer.get(`/v1/annealing/plans/${reply.body.id}`);
      expect(stored.status).toBe(200);
      expect(stored.body.plan).toEqual(reply.body.plan);
      expect(stored.body.cautions).toHaveLength(ANNEALING_CAUTIONS.length);
    }));

  it('plans a polycarbonate model at a given thickness and exports the segment CSV, which parses back to the plan', () =>
    inLab(async ({ technician, viewer, make }) => {
      const { model } = await annealingModel(make, 'polycarbonate', 6.1);
      const reply = await technician.post(`/v1/models/${model.id}/annealing-plans`, { maxSectionThicknessMm: 8, ovenLimits: { maxHeatingRateCPerH: 15 } });
      expect(reply.status).toBe(201);
      expect(reply.body).toMatchObject({ guidanceKey: 'polycarbonate-sheet.zakeri-2013', thicknessSource: 'given', maxSectionThicknessMm: 8, ovenLimits: { maxHeatingRateCPerH: 15 } });
      const segments = reply.body.plan.segments as { number: number; kind: string; endTemperatureC: number; rateCPerH: number | null; durationH: number }[];
      const heating = segments.filter((s) => s.kind === 'ramp' && s.endTemperatureC > (s as unknown as { startTemperatureC: number }).startTemperatureC);
      expect(Math.max(...heating.map((s) => s.rateCPerH!))).toBeLessThanOrEqual(15);
      const csv = await viewer.get(`/v1/annealing/plans/${reply.body.id}?format=csv`);
      expect(csv.status).toBe(200);
      expect(csv.headers.get('content-type')).toContain('text/csv');
      expect(csv.headers.get('x-annealing-cautions')).toContain('overshoot');
      const rows = parse(csv.text, { columns: true }) as Record<string, string>[];
      expect(rows).toHaveLength(segments.length);
      rows.forEach((row, i) => {
        const s = segments[i]!;
        expect(Number(row.segment)).toBe(s.number);
        expect(row.kind).toBe(s.kind);
        expect(Number(row.target_c)).toBe(s.endTemperatureC);
        expect(row.rate_c_per_h === '' ? null : Number(row.rate_c_per_h)).toBe(s.rateCPerH);
        const [h, m] = row.duration_h_mm!.split(':').map(Number);
        expect(Math.abs(h! + m! / 60 - s.durationH)).toBeLessThanOrEqual(1 / 60);
      });
    }));

  it('lets only technicians and admins store plans, and a replacement names the plan it supersedes with a reason', () =>
    inLab(async ({ technician, viewer, make }) => {
      const { model } = await annealingModel(make, 'polycarbonate', 6);
      expect((await viewer.post(`/v1/models/${model.id}/annealing-plans`, {})).status).toBe(403);
      const first = await technician.post(`/v1/models/${model.id}/annealing-plans`, {});
      expect((await technician.post(`/v1/models/${model.id}/annealing-plans`, { supersedesPlanId: first.body.id })).status).toBe(422);
      const second = await technician.post(`/v1/models/${model.id}/annealing-plans`, { supersedesPlanId: first.body.id, reason: 'Oven 2 cannot ramp slower than 2 °C/h.', ovenLimits: { minRateCPerH: 2 } });
      expect(second.status).toBe(201);
      const list = await viewer.get(`/v1/models/${model.id}/annealing-plans`);
      // Both rows share the test transaction's timestamp, so compare by id rather than order.
      const successors = new Map(list.body.map((p: { id: string; supersededById: string | null }) => [p.id, p.supersededById]));
      expect(successors).toEqual(new Map([[first.body.id, second.body.id], [second.body.id, null]]));
      expect((await technician.post(`/v1/models/${model.id}/annealing-plans`, { supersedesPlanId: first.body.id, reason: 'again' })).status).toBe(409);
    }));
});
