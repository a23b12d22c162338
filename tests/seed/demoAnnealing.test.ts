import { describe, expect, it } from 'vitest';
import { createApp } from '../../api/createApp.ts';
import { defaultConfig } from '../../api/env.ts';
import { loadDemoScenario } from '../../seed/loadDemoScenario.ts';
import { clientFor } from '../support/client.ts';
import { testDatabase } from '../support/testDatabase.ts';

class RollBack extends Error {}

describe('the demo lab\'s annealing run', () => {
  it('has one completed run for SN-B1 with a conforming log, and the model came out within its limit', async () => {
    const db = await testDatabase();
    await db
      .transaction(async (tx) => {
        const demo = await loadDemoScenario(tx);
        const viewer = clientFor(createApp({ db: tx, config: defaultConfig() }), demo.keys[2]!.secret);
        const runs = await viewer.get('/v1/annealing/runs');
        expect(runs.body.items).toHaveLength(1);
        const run = await viewer.get(`/v1/annealing/runs/${runs.body.items[0].id}`);
        expect(run.body.models.map((m: { code: string }) => m.code)).toEqual(['SN-B1']);
        expect(run.body.plan.guidanceKey).toBe('polycarbonate-sheet.demo-lab-132');
        expect(run.body.currentLog.verdict).toBe('pass');
        const effect = await viewer.get(`/v1/annealing/runs/${run.body.id}/effectiveness`);
        expect(effect.body.summary).toMatchObject({ sitesWithRelief: 2, modelsMeasured: 1, modelsWithinLimit: 1 });
        const recommendation = await viewer.get(`/v1/models/${run.body.models[0].id}/annealing-recommendation`);
        expect(recommendation.body.cycle).toMatchObject({ key: 'polycarbonate-sheet.demo-lab-132', chosenBy: 'house_cycle' });
        expect(recommendation.body.history).toMatchObject({ runs: 1, modelsWithinLimit: 1 });
        throw new RollBack();
      })
      .catch((e) => {
        if (!(e instanceof RollBack)) throw e;
      });
  });
});
