import { describe, expect, it } from 'vitest';
import { listRunsInPlay } from '../../../../db/operations/annealing/listRunsInPlay.ts';
import { findActorByKey } from '../../../../db/operations/keys/findActorByKey.ts';
import { annealingModel, hoursAfter, importOvenLog, ovenLogCsv } from '../../../support/annealingHelpers.ts';
import { inLab } from '../../../support/inLab.ts';

const NOW = '2026-11-24T12:00:00Z';
const DAY_H = 24;

describe('listRunsInPlay', () => {
  it('lists runs not started, in the oven, or over without a log; leaves out logged, amended and old ones', () =>
    inLab(async ({ db, keys, technician, make }) => {
      const actor = (await findActorByKey(db, keys.viewer))!;
      const { model } = await annealingModel(make, 'cast_acrylic', 6);
      const plan = (await technician.post(`/v1/models/${model.id}/annealing-plans`, {})).body;
      expect(plan.totalDurationH).toBeLessThan(5 * DAY_H);
      const run = async (ovenName: string, startedAt: string) => {
        const reply = await technician.post('/v1/annealing/runs', { planId: plan.id, ovenName, modelIds: [model.id], operator: 'T. Haddad', startedAt });
        expect(reply.status, reply.text).toBe(201);
        return reply.body;
      };
      const scheduled = await run('oven A', hoursAfter(NOW, 2));
      const inOven = await run('oven B', hoursAfter(NOW, -1));
      const unlogged = await run('oven C', hoursAfter(NOW, -10 * DAY_H));
      const logged = await run('oven D', hoursAfter(NOW, -11 * DAY_H));
      expect((await importOvenLog(technician, logged.id, ovenLogCsv(plan.plan.segments, { stepH: 0.05, noiseC: 0.1, stream: 3 }))).status).toBe(201);
      const replaced = await run('oven E', hoursAfter(NOW, -12 * DAY_H));
      const amendment = await technician.post(`/v1/annealing/runs/${replaced.id}/amendments`, { planId: plan.id, ovenName: 'oven F', modelIds: [model.id], operator: 'T. Haddad', startedAt: replaced.startedAt, reason: 'The load went into oven F.' });
      expect(amendment.status, amendment.text).toBe(201);
      await run('oven G', hoursAfter(NOW, -60 * DAY_H));

      const now = new Date(NOW);
      const listed = await listRunsInPlay(db, actor, { now, since: new Date(Date.parse(NOW) - 45 * DAY_H * 3_600_000), limit: 20 });
      expect(listed.map((r) => [r.ovenName, r.status])).toEqual([
        ['oven F', 'awaiting_log'],
        ['oven C', 'awaiting_log'],
        ['oven B', 'in_oven'],
        ['oven A', 'scheduled'],
      ]);
      const b = listed.find((r) => r.id === inOven.id)!;
      expect(b.modelCodes).toEqual([model.code]);
      expect(b.plannedEndAt.getTime() - b.startedAt.getTime()).toBeCloseTo(plan.totalDurationH * 3_600_000, 0);
      expect(listed.map((r) => r.id)).toContain(scheduled.id);
      expect(listed.map((r) => r.id)).toContain(unlogged.id);
      expect((await listRunsInPlay(db, actor, { now, since: new Date(Date.parse(NOW) - 45 * DAY_H * 3_600_000), limit: 2 })).map((r) => r.ovenName)).toEqual(['oven F', 'oven C']);
    }));
});
