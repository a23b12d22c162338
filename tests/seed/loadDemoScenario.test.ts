import { describe, expect, it } from 'vitest';
import { createApp } from '../../api/createApp.ts';
import { defaultConfig } from '../../api/env.ts';
import { loadDemoScenario } from '../../seed/loadDemoScenario.ts';
import { DEMO_MODELS } from '../../seed/demoScenario.ts';
import { clientFor } from '../support/client.ts';
import { testDatabase } from '../support/testDatabase.ts';

class RollBack extends Error {}

describe('the demo lab', () => {
  it('loads through the API operations and is readable with its printed keys', async () => {
    const db = await testDatabase();
    await db
      .transaction(async (tx) => {
        const demo = await loadDemoScenario(tx);
        expect(demo.keys.map((k) => k.role)).toEqual(['admin', 'technician', 'viewer']);
        const viewer = clientFor(createApp({ db: tx, config: defaultConfig() }), demo.keys[2]!.secret);
        const models = await viewer.get('/v1/models?limit=200');
        expect(models.body.items.map((m: { code: string }) => m.code).sort()).toEqual(DEMO_MODELS.map((m) => m.code).sort());
        const stored = models.body.items.find((m: { code: string }) => m.code === 'ST-A4');
        const detail = await viewer.get(`/v1/models/${stored.id}`);
        expect(detail.body.derived.lastMachiningMethod).toBe('milling');
        expect(detail.body.derived.hoursSinceMachining).toBeGreaterThan(20 * 24 - 0.01);
        expect(detail.body.derived.hoursSinceMachining).toBeLessThan(20 * 24 + 0.5);
        const site = detail.body.sites[0];
        const readings = await viewer.get(`/v1/sites/${site.id}/readings`);
        expect(readings.body.items).toHaveLength(6);
        throw new RollBack();
      })
      .catch((e) => {
        if (!(e instanceof RollBack)) throw e;
      });
  });
});
