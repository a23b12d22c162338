import { count, eq } from 'drizzle-orm';
import { describe, expect, it } from 'vitest';
import { ovenLogSamples, ovenLogs } from '../../db/schema/index.ts';
import { annealingModel, importOvenLog, ovenLogCsv } from '../support/annealingHelpers.ts';
import { inLab, type LabContext } from '../support/inLab.ts';

const STARTED_AT = '2026-11-24T07:30:00Z';

async function plannedRun({ technician, make }: LabContext, family = 'cast_acrylic', thicknessMm = 6) {
  const { model } = await annealingModel(make, family, thicknessMm);
  const plan = await technician.post(`/v1/models/${model.id}/annealing-plans`, {});
  const run = await technician.post('/v1/annealing/runs', { planId: plan.body.id, ovenName: 'Oven 2 (forced air)', modelIds: [model.id], operator: 'T. Haddad', startedAt: STARTED_AT });
  expect(run.status).toBe(201);
  return { model, plan: plan.body, run: run.body };
}

describe('annealing runs and oven logs', () => {
  it('records a run with its load and puts an annealed event on the model timeline', () =>
    inLab(async (lab) => {
      const { model, plan, run } = await plannedRun(lab);
      expect(run).toMatchObject({ planId: plan.id, ovenName: 'Oven 2 (forced air)', operator: 'T. Haddad', startedAt: '2026-11-24T07:30:00.000Z', currentLog: null, warnings: [] });
      expect(run.models.map((m: { id: string }) => m.id)).toEqual([model.id]);
      expect(run.cautions.length).toBeGreaterThan(0);
      const events = await lab.viewer.get(`/v1/models/${model.id}/events`);
      expect(events.body.items.map((e: { kind: string }) => e.kind)).toEqual(['annealed']);
      expect((await lab.viewer.post('/v1/annealing/runs', { ...run, modelIds: [model.id] })).status).toBe(403);
    }));

  it('passes a clean log of a few thousand samples', () =>
    inLab(async (lab) => {
      const { plan, run } = await plannedRun(lab);
      const csv = ovenLogCsv(plan.plan.segments, { stepH: 0.004, noiseC: 0.1, stream: 11 });
      const reply = await importOvenLog(lab.technician, run.id, csv);
      expect(reply.status).toBe(201);
      expect(reply.body.sampleCount).toBeGreaterThan(2000);
      expect(reply.body.comparison.reasons).toEqual(['The log follows the plan within every tolerance.']);
      expect(reply.body.verdict).toBe('pass');
      expect(reply.body.cautions.length).toBeGreaterThan(0);
      const stored = await lab.db.select({ n: count() }).from(ovenLogSamples).where(eq(ovenLogSamples.logId, reply.body.id));
      expect(stored[0]!.n).toBe(reply.body.sampleCount);
      const exported = await lab.viewer.get(`/v1/annealing/oven-logs/${reply.body.id}?format=csv`);
      expect(exported.text.split('\n')[0]).toBe('elapsed_h,temperature_c');
      expect((await lab.viewer.get(`/v1/annealing/runs/${run.id}`)).body.currentLog).toMatchObject({ id: reply.body.id, verdict: 'pass' });
    }));

  it('lets a lab widen the rate window for a noisy logger, and stores the tolerances used', () =>
    inLab(async (lab) => {
      const { plan, run } = await plannedRun(lab);
      // 0.3 °C noise every 15 s passes on the default 0.5 h slope window too; a lab may still ask for a longer one.
      const noisy = ovenLogCsv(plan.plan.segments, { stepH: 0.004, noiseC: 0.3, stream: 11 });
      expect((await importOvenLog(lab.technician, run.id, noisy)).body.verdict).toBe('pass');
      const { run: second } = await plannedRun(lab);
      const reply = await importOvenLog(lab.technician, second.id, noisy, '?rateWindowH=2');
      expect(reply.status).toBe(201);
      expect(reply.body.comparison.tolerances.rateWindowH).toBe(2);
      expect(reply.body.verdict).toBe('pass');
    }));

  it('fails a log with an overshoot during the soak and says so; a corrected log supersedes it with a reason', () =>
    inLab(async (lab) => {
      const { plan, run } = await plannedRun(lab);
      const soak = plan.plan.segments.find((s: { kind: string }) => s.kind === 'soak');
      const overshootFromH = soak.startH + 2;
      const csv = ovenLogCsv(plan.plan.segments, { stepH: 0.01, noiseC: 0.2, stream: 5, shape: (t, c) => (t > overshootFromH && t < overshootFromH + 0.5 ? c + 9 : c) });
      const reply = await importOvenLog(lab.technician, run.id, csv);
      expect(reply.status).toBe(201);
      expect(reply.body.verdict).toBe('fail');
      const overshoot = reply.body.comparison.findings.find((f: { kind: string }) => f.kind === 'overshoot');
      expect(overshoot).toMatchObject({ severity: 'fault' });
      expect(overshoot.numbers.peakC).toBeGreaterThan(88);
      expect(reply.body.comparison.reasons.join(' ')).toMatch(/above the plan's 80 °C/);
      const clean = ovenLogCsv(plan.plan.segments, { stepH: 0.01, noiseC: 0.2, stream: 6 });
      expect((await importOvenLog(lab.technician, run.id, clean)).status).toBe(409);
      const second = await importOvenLog(lab.technician, run.id, clean, `?supersedesLogId=${reply.body.id}&reason=${encodeURIComponent('Logger channel 2 was on the heater, not the load; re-exported channel 1.')}`);
      expect(second.status).toBe(201);
      expect(second.body).toMatchObject({ verdict: 'pass', supersedesId: reply.body.id });
      expect((await lab.viewer.get(`/v1/annealing/oven-logs/${reply.body.id}`)).body).toMatchObject({ verdict: 'fail', supersededById: second.body.id });
    }));

  it('refuses bad CSV rows with their row and column, and writes nothing', () =>
    inLab(async (lab) => {
      const { run } = await plannedRun(lab);
      const csv = 'elapsed_h,temperature_c\n0,23\n0.1,2,6\n0.2,hot\n0.15,30\n0.3,3000\n';
      const reply = await importOvenLog(lab.technician, run.id, csv);
      expect(reply.status).toBe(422);
      expect(reply.headers.get('content-type')).toContain('application/problem+json');
      expect(reply.body.errors).toEqual([
        { row: 3, field: 'file', message: 'the row has 3 cells, the header 2' },
        { row: 4, field: 'temperature_c', message: '"hot" is not a number' },
        { row: 5, field: 'elapsed_h', message: 'time runs backwards here (a clock reset or two files joined?)' },
        { row: 6, field: 'temperature_c', message: '3000 °C is outside -50..1600 °C: a unit or typing error?' },
      ]);
      const header = await importOvenLog(lab.technician, run.id, 'time;temp\n0;23\n1;30\n');
      expect(header.body.errors.map((e: { field: string }) => e.field)).toEqual(['elapsed_h', 'temperature_c']);
      expect((await lab.technician.send('POST', `/v1/annealing/runs/${run.id}/oven-logs/import`, { body: '{}', headers: { 'content-type': 'application/json' } })).status).toBe(415);
      expect((await lab.db.select().from(ovenLogs)).filter((l) => l.runId === run.id)).toEqual([]);
      expect((await lab.viewer.get(`/v1/annealing/runs/${run.id}`)).body.currentLog).toBeNull();
    }));

  it('keeps runs and logs immutable in the database itself', () =>
    inLab(async (lab) => {
      const { plan, run } = await plannedRun(lab);
      await importOvenLog(lab.technician, run.id, ovenLogCsv(plan.plan.segments, { stepH: 0.05, noiseC: 0, stream: 1 }));
      await expect(lab.db.transaction((tx) => tx.update(ovenLogs).set({ verdict: 'pass' }))).rejects.toThrow();
      await expect(lab.db.transaction((tx) => tx.delete(ovenLogSamples))).rejects.toThrow();
      const amended = await lab.technician.post(`/v1/annealing/runs/${run.id}/amendments`, { planId: plan.id, ovenName: 'Oven 1 (forced air)', modelIds: run.models.map((m: { id: string }) => m.id), operator: 'T. Haddad', startedAt: STARTED_AT, reason: 'The load went into oven 1.' });
      expect(amended.status).toBe(201);
      expect(amended.body).toMatchObject({ supersedesId: run.id, amendmentReason: 'The load went into oven 1.' });
      expect((await lab.viewer.get(`/v1/annealing/runs/${run.id}`)).body.supersededById).toBe(amended.body.id);
    }));
});
