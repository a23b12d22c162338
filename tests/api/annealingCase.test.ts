import { describe, expect, it } from 'vitest';
import { annealingModel, hoursAfter, importOvenLog, ovenLogCsv, tardyOrder } from '../support/annealingHelpers.ts';
import { inLab } from '../support/inLab.ts';

const READ_BEFORE_AT = '2026-11-24T06:00:00Z';
const STARTED_AT = '2026-11-24T07:30:00Z';

describe('annealing, the whole case', () => {
  it('a model over its limit gets a plan, a run and a conforming log, and after annealing it passes', () =>
    inLab(async ({ technician, viewer, make }) => {
      const { model } = await annealingModel(make, 'polycarbonate', 6);
      const site = await make.site({ modelId: model.id, label: 'upper notch root' });
      const reading = (stage: string, observedAt: string, order: number) =>
        technician.post(`/v1/sites/${site.id}/readings`, { stage, observedAt, operator: 'A. Tester', wavelengthNm: 577, reading: tardyOrder(order) });
      const before = await reading('before_anneal', READ_BEFORE_AT, 0.5);
      expect(before.status).toBe(201);

      const first = await viewer.get(`/v1/models/${model.id}/annealing-recommendation`);
      expect(first.status).toBe(200);
      expect(first.body).toMatchObject({ decision: 'needs_annealing', needsAnnealing: true, cycle: { key: 'polycarbonate-sheet.zakeri-2013', chosenBy: 'published_default' }, maxSectionThicknessMm: 6, history: null });
      expect(first.body.limits.source).toBe('common_practice');
      expect(first.body.cautions.length).toBeGreaterThan(0);

      const plan = await technician.post(`/v1/models/${model.id}/annealing-plans`, {});
      expect(plan.status).toBe(201);
      expect(plan.body.plan.segments).toEqual(first.body.plan.segments);
      const run = await technician.post('/v1/annealing/runs', { planId: plan.body.id, ovenName: 'Oven 2 (forced air)', modelIds: [model.id], operator: 'T. Haddad', startedAt: STARTED_AT });
      expect(run.status).toBe(201);
      const log = await importOvenLog(technician, run.body.id, ovenLogCsv(plan.body.plan.segments, { stepH: 1 / 60, noiseC: 0.1, stream: 21, extraH: 1 }));
      expect(log.status).toBe(201);
      expect(log.body.verdict).toBe('pass');

      const after = await reading('after_anneal', hoursAfter(STARTED_AT, plan.body.totalDurationH + 3), 0.05);
      expect(after.status).toBe(201);
      const effect = await viewer.get(`/v1/annealing/runs/${run.body.id}/effectiveness`);
      expect(effect.status).toBe(200);
      expect(effect.body).toMatchObject({ logVerdict: 'pass', summary: { sitesWithRelief: 1, modelsMeasured: 1, modelsWithinLimit: 1 } });
      const [siteOutcome] = effect.body.models[0].sites;
      expect(siteOutcome).toMatchObject({ before: { readingId: before.body.id }, after: { readingId: after.body.id }, afterDecision: 'conforming', limitFringeOrder: 0.2, limitSource: 'common_practice' });
      // Hand derivation [C]: R = (a − b)/a = 1 − b/a, so u(R)² = (u_b/a)² + (b·u_a/a²)² for independent readings.
      const [a, ua, b, ub] = [before.body.fringeOrder, before.body.fringeOrderUncertainty, after.body.fringeOrder, after.body.fringeOrderUncertainty];
      expect(siteOutcome.relief.ratio.value).toBeCloseTo(0.9, 10);
      expect(siteOutcome.relief.ratio.uncertainty).toBeCloseTo(Math.hypot(ub / a, (b * ua) / a ** 2), 10);

      const last = await viewer.get(`/v1/models/${model.id}/annealing-recommendation`);
      expect(last.body).toMatchObject({ decision: 'conforming', needsAnnealing: false, history: { runs: 1, modelsMeasured: 1, modelsWithinLimit: 1, withinLimitFraction: 1 } });
      expect(last.body.history.medianRelief).toBeCloseTo(0.9, 10);
      expect(last.body.historySummary).toMatch(/1 of 1 model/);
      const history = await viewer.get('/v1/annealing/effectiveness?materialFamily=polycarbonate');
      expect(history.body).toHaveLength(1);
      expect(history.body[0]).toMatchObject({ guidanceKey: 'polycarbonate-sheet.zakeri-2013', runs: 1, modelsWithinLimit: 1, limitSources: ['common_practice'] });
    }));
});
