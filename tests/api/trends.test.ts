import { parse } from 'csv-parse/sync';
import { linearRegression, mean, quantileSorted, sampleStandardDeviation as ssSampleSd } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import { arithmeticMean } from '../../src/statistics/arithmeticMean.ts';
import { compareGroups } from '../../src/statistics/compareGroups.ts';
import { fitEdgeAging } from '../../src/statistics/fitEdgeAging.ts';
import { individualsMovingRangeChart } from '../../src/statistics/individualsMovingRangeChart.ts';
import { percentileLinear } from '../../src/statistics/percentileLinear.ts';
import { sampleStandardDeviation } from '../../src/statistics/sampleStandardDeviation.ts';
import { inLab } from '../support/inLab.ts';
import { type BuiltReading, buildAgingModels, buildTrendLab, TREND_T0 } from '../support/trendFactories.ts';

const HOUR_MS = 3_600_000;
const sorted = (values: number[]) => [...values].sort((a, b) => a - b);

/** Expected statistics of one group, by the project's functions and by simple-statistics. */
function expectDistribution(actual: { mean: number; standardDeviation: number; median: number; percentiles: { p: number; value: number }[] }, values: number[]) {
  const s = sorted(values);
  expect(actual.mean).toBeCloseTo(arithmeticMean(values), 12);
  // simple-statistics (reference library from npm): mean, sample SD and type-7 quantiles.
  expect(actual.mean).toBeCloseTo(mean(values), 12);
  expect(actual.standardDeviation).toBeCloseTo(sampleStandardDeviation(values), 12);
  expect(actual.standardDeviation).toBeCloseTo(ssSampleSd(values), 12);
  expect(actual.median).toBeCloseTo(percentileLinear(s, 0.5), 12);
  for (const { p, value } of actual.percentiles) {
    expect(value).toBeCloseTo(percentileLinear(s, p), 12);
    expect(value).toBeCloseTo(quantileSorted(s, p), 12);
  }
}

const groupOf = (readings: BuiltReading[], key: (r: BuiltReading) => string) => {
  const groups = new Map<string, BuiltReading[]>();
  for (const r of readings) groups.set(key(r), [...(groups.get(key(r)) ?? []), r]);
  return groups;
};

describe('residual trends', () => {
  it('groups by batch in SQL and agrees with the statistics core and simple-statistics; the bad batch stands out', () =>
    inLab(async ({ admin, viewer, make }) => {
      const lab = await buildTrendLab(admin, make);
      const reply = await viewer.get('/v1/trends/residuals?groupBy=batch&p=0.9,0.95');
      expect(reply.status).toBe(200);
      const body = reply.body;
      expect(body.readingCount).toBe(32);
      expect(body.modelCount).toBe(8);
      expect(body.limit).toMatchObject({ fringeOrder: 0.2, source: expect.stringContaining('common practice') });
      expect(body.groups.map((g: { key: string }) => g.key).sort()).toEqual([lab.batches.good, lab.batches.bad].sort());
      for (const [code, readings] of groupOf(lab.readings, (r) => r.batchCode)) {
        const group = body.groups.find((g: { key: string }) => g.key === code);
        expect(group.readingCount).toBe(readings.length);
        expect(group.modelCount).toBe(4);
        expectDistribution(group.fringeOrder577, readings.map((r) => r.order577));
        expectDistribution(group.stressMPa, readings.map((r) => r.stressMPa));
        const over = readings.filter((r) => r.order577 > 0.2);
        expect(group.overLimit.readings).toBe(over.length);
        expect(group.overLimit.models).toBe(new Set(over.map((r) => r.modelId)).size);
      }
      expectDistribution(body.total.fringeOrder577, lab.readings.map((r) => r.order577));
      const good = body.groups.find((g: { key: string }) => g.key === lab.batches.good);
      const bad = body.groups.find((g: { key: string }) => g.key === lab.batches.bad);
      expect(good.overLimit.modelShare).toBe(0);
      expect(bad.overLimit.modelShare).toBe(1);
      expect(bad.fringeOrder577.median).toBeGreaterThan(3 * good.fringeOrder577.median);
    }));

  it('reduces to 577 nm, counts only current readings, and groups by machining method, operator and week', () =>
    inLab(async ({ admin, viewer, make }) => {
      const lab = await buildTrendLab(admin, make);
      const byMethod = (await viewer.get('/v1/trends/residuals?groupBy=machiningMethod&p=0.5')).body;
      for (const [method, readings] of groupOf(lab.readings, (r) => r.machiningMethod)) {
        const group = byMethod.groups.find((g: { key: string }) => g.key === method);
        expect(group.readingCount, method).toBe(readings.length);
        expect(group.fringeOrder577.mean).toBeCloseTo(arithmeticMean(readings.map((r) => r.order577)), 12);
      }
      const byOperator = (await viewer.get('/v1/trends/residuals?groupBy=operator')).body;
      expect(byOperator.groups.map((g: { key: string; readingCount: number }) => [g.key, g.readingCount])).toEqual(
        [...groupOf(lab.readings, (r) => r.operator)].map(([k, v]) => [k, v.length]).sort(),
      );
      const byWeek = (await viewer.get('/v1/trends/residuals?groupBy=week')).body;
      expect(byWeek.groups.map((g: { key: string }) => g.key)).toEqual(['2026-W41']);
      // 0.05 fringe read at 546 nm is 0.05·546/577 at 577 nm [C].
      const narrowed = (await viewer.get(`/v1/trends/residuals?batch=${lab.batches.good}&operator=A.%20Ahn&to=2026-10-05T11:00:00Z`)).body;
      expect(narrowed.readingCount).toBe(2);
      expect(narrowed.total.fringeOrder577.mean).toBeCloseTo((0.05 * 546 / 577 + 0.06) / 2, 12);
    }));

  it('answers the same figures as CSV', () =>
    inLab(async ({ admin, viewer, make }) => {
      await buildTrendLab(admin, make);
      const json = (await viewer.get('/v1/trends/residuals?groupBy=batch&p=0.9')).body;
      const reply = await viewer.get('/v1/trends/residuals?groupBy=batch&p=0.9&format=csv');
      expect(reply.status).toBe(200);
      expect(reply.headers.get('content-type')).toContain('text/csv');
      const rows = parse(reply.text, { columns: true }) as Record<string, string>[];
      expect(rows).toHaveLength(3);
      expect(rows.map((r) => r.scope)).toEqual(['group', 'group', 'all']);
      for (const [i, group] of [...json.groups, json.total].entries()) {
        expect(rows[i]!.group_key).toBe(group.key ?? '');
        expect(Number(rows[i]!.reading_count)).toBe(group.readingCount);
        expect(Number(rows[i]!.model_count)).toBe(group.modelCount);
        expect(Number(rows[i]!.mean_order_577nm)).toBe(group.fringeOrder577.mean);
        expect(Number(rows[i]!.p90_order_577nm)).toBe(group.fringeOrder577.percentiles[0].value);
        expect(Number(rows[i]!.median_stress_mpa)).toBe(group.stressMPa.median);
        expect(Number(rows[i]!.models_over_limit)).toBe(group.overLimit.models);
      }
    }));

  it('refuses bad queries and keeps other labs out', () =>
    inLab(async ({ admin, viewer, make, otherLab }) => {
      await buildTrendLab(admin, make);
      expect((await viewer.get('/v1/trends/residuals?p=1.5')).status).toBe(422);
      expect((await viewer.get('/v1/trends/residuals?groupBy=colour')).status).toBe(422);
      expect((await viewer.get('/v1/trends/residuals?stage=under_load')).status).toBe(422);
      const other = await otherLab();
      const empty = (await other.admin.get('/v1/trends/residuals')).body;
      expect(empty.readingCount).toBe(0);
      expect(empty.groups).toEqual([]);
      expect(empty.total.fringeOrder577.mean).toBeNull();
    }));
});

describe('control chart', () => {
  it('puts one point per model of a batch in machining order and matches individualsMovingRangeChart', () =>
    inLab(async ({ admin, viewer, make }) => {
      const lab = await buildTrendLab(admin, make);
      const reply = await viewer.get(`/v1/trends/control-chart?batch=${lab.batches.bad}`);
      expect(reply.status).toBe(200);
      const models = [...groupOf(lab.readings.filter((r) => r.batchCode === lab.batches.bad), (r) => r.modelId).values()];
      const expected = individualsMovingRangeChart(models.map((rs, i) => ({ x: i, value: arithmeticMean(rs.map((r) => r.order577)) })));
      expect(expected.defined).toBe(true);
      const chart = reply.body.chart;
      expect(reply.body).toMatchObject({ series: 'batch', readingCount: 16, modelCount: 4 });
      if (!expected.defined) return;
      expect(chart.centreLine).toBeCloseTo(expected.centreLine, 12);
      expect(chart.individuals.upperLimit).toBeCloseTo(expected.individuals.upperLimit, 12);
      expect(chart.movingRangeChart.upperLimit).toBeCloseTo(expected.movingRangeChart.upperLimit, 12);
      expect(chart.points.map((p: { modelId: string }) => p.modelId)).toEqual(models.map((rs) => rs[0]!.modelId));
      expect(chart.warnings[0]).toContain('provisional');
    }));

  it('charts one model\'s readings in time order and refuses an ambiguous series', () =>
    inLab(async ({ admin, viewer, make }) => {
      const lab = await buildTrendLab(admin, make);
      const modelId = lab.readings[0]!.modelId;
      const reply = await viewer.get(`/v1/trends/control-chart?modelId=${modelId}&measure=stress`);
      expect(reply.status).toBe(200);
      // Two sites are read at the same instant, so compare per time, not by position.
      const key = (at: string, value: number) => `${Date.parse(at)}|${value.toFixed(12)}`;
      const mine = lab.readings.filter((r) => r.modelId === modelId).map((r) => key(r.observedAt, r.stressMPa)).sort();
      const points = reply.body.chart.points as { x: string; value: number }[];
      expect(points.map((p) => key(p.x, p.value)).sort()).toEqual(mine);
      expect(points.map((p) => p.x)).toEqual(points.map((p) => p.x).sort());
      expect((await viewer.get('/v1/trends/control-chart')).status).toBe(422);
      expect((await viewer.get(`/v1/trends/control-chart?modelId=${modelId}&batch=${lab.batches.good}`)).status).toBe(422);
      expect((await viewer.get('/v1/trends/control-chart?batch=no-such-batch')).status).toBe(404);
    }));
});

describe('comparison of two groups', () => {
  it('compares two batches model by model, as compareGroups does on the same means', () =>
    inLab(async ({ admin, viewer, make }) => {
      const lab = await buildTrendLab(admin, make);
      const reply = await viewer.get(`/v1/trends/compare?by=batch&a=${lab.batches.good}&b=${lab.batches.bad}`);
      expect(reply.status).toBe(200);
      const means = (code: string) =>
        [...groupOf(lab.readings.filter((r) => r.batchCode === code), (r) => r.modelId)].sort(([a], [b]) => a.localeCompare(b)).map(([, rs]) => arithmeticMean(rs.map((r) => r.order577)));
      const expected = compareGroups(means(lab.batches.good), means(lab.batches.bad));
      expect(reply.body.a).toMatchObject({ n: 4, readingCount: 16, modelCount: 4 });
      expect(reply.body.comparison.decided).toBe(true);
      if (!expected.decided || !expected.welch.defined || !expected.mannWhitney.defined) throw new Error('expected a decided comparison');
      expect(reply.body.comparison.welch.differenceOfMeans).toBeCloseTo(expected.welch.differenceOfMeans, 12);
      expect(reply.body.comparison.welch.confidenceInterval.upper).toBeLessThan(0);
      expect(reply.body.comparison.mannWhitney.u).toBe(expected.mannWhitney.u);
      const perReading = (await viewer.get(`/v1/trends/compare?by=batch&a=${lab.batches.good}&b=${lab.batches.bad}&unit=reading`)).body;
      expect([perReading.a.n, perReading.b.n]).toEqual([16, 16]);
    }));

  it('says when groups are too small, or empty, and refuses a group compared with itself', () =>
    inLab(async ({ admin, viewer, make }) => {
      await buildTrendLab(admin, make);
      const small = (await viewer.get('/v1/trends/compare?by=machiningMethod&a=fly%20cutting&b=band%20sawing')).body;
      expect(small.comparison).toMatchObject({ decided: false, nA: 2, nB: 2 });
      expect(small.comparison.reason).toContain('at least 3');
      const missing = (await viewer.get('/v1/trends/compare?by=batch&a=nothing-here&b=nor-here')).body;
      expect(missing.warnings).toHaveLength(2);
      expect((await viewer.get('/v1/trends/compare?by=batch&a=x&b=x')).status).toBe(422);
    }));
});

describe('edge aging', () => {
  // A synthetic time-edge series on N = 0.02 + 0.012·√h with a small alternating offset, so the
  // fit is not exact: the limit 0.2 is crossed at ((0.2 − 0.02)/0.012)² = 225 h [C].
  const orderAt = (h: number) => 0.02 + 0.012 * Math.sqrt(h) + (Math.round(h) % 2 === 0 ? 0.002 : -0.002);
  const plan = [{ hours: [1, 4, 16, 36] }, { hours: [9, 25, 49, 81] }, { hours: [64, 100, 121, 144] }].map((p) => ({ ...p, orderAt }));

  it('fits the √t law over the stored models and dates each one\'s test-before time', () =>
    inLab(async ({ admin, viewer, make }) => {
      const batch = await make.batch();
      const models = await buildAgingModels(admin, make, batch.id, plan);
      const at = new Date(TREND_T0 + 100 * HOUR_MS).toISOString();
      const reply = await viewer.get(`/v1/trends/edge-aging?batch=${batch.code}&at=${at}`);
      expect(reply.status).toBe(200);
      const body = reply.body;
      expect(body).toMatchObject({ pointCount: 12, readingCount: 12, modelCount: 3, readingsWithoutMachining: 0, storedModelCount: 3 });
      const points = plan.flatMap((p) => p.hours.map((h) => ({ hoursSinceMachining: h, residualOrder: orderAt(h) })));
      const expected = fitEdgeAging(points, { limitOrder: 0.2 });
      if (!expected.defined || expected.forecast.reached !== 'forecast') throw new Error('expected a forecast');
      expect(body.fit.chosen).toBe('sqrtTime');
      // simple-statistics linearRegression (reference library) on (√h, N) gives the same line.
      const line = linearRegression(points.map((p) => [Math.sqrt(p.hoursSinceMachining), p.residualOrder]));
      expect(body.fit.sqrtTime.slopeOrderPerSqrtH.value).toBeCloseTo(line.m, 10);
      expect(body.fit.sqrtTime.interceptOrder.value).toBeCloseTo(line.b, 10);
      expect(body.fit.forecast.testBeforeH.value).toBeCloseTo(expected.forecast.testBeforeH.value, 8);
      expect(body.fit.forecast.testBeforeH.value).toBeGreaterThan(215);
      expect(body.fit.forecast.testBeforeH.value).toBeLessThan(235);
      const testBeforeMs = TREND_T0 + expected.forecast.testBeforeH.value * HOUR_MS;
      for (const stored of body.storedModels) {
        expect(models.map((m) => m.modelCode)).toContain(stored.modelCode);
        expect(stored.hoursSinceMachining).toBeCloseTo(100, 9);
        expect(Date.parse(stored.testBeforeAt)).toBeCloseTo(testBeforeMs, -1);
        expect(stored.hoursRemaining).toBeCloseTo(expected.forecast.testBeforeH.value - 100, 8);
      }
      expect(body.storedModels.map((s: { status: string }) => s.status).sort()).toEqual(['forecast', 'forecast', 'forecast']);
    }));

  it('marks a model over its limit, leaves out models no longer stored, and declines a fit on too few points', () =>
    inLab(async ({ admin, viewer, make }) => {
      const batch = await make.batch();
      const [, , late] = await buildAgingModels(admin, make, batch.id, [...plan.slice(0, 2), { hours: [400], orderAt }]);
      const loaded = await buildAgingModels(admin, make, batch.id, [{ hours: [2], orderAt }]);
      await admin.post(`/v1/models/${loaded[0]!.modelId}/events`, { kind: 'loaded', occurredAt: new Date(TREND_T0 + 3 * HOUR_MS).toISOString(), operator: 'C. Cruz', loadN: 500 });
      const body = (await viewer.get(`/v1/trends/edge-aging?batch=${batch.code}&at=${new Date(TREND_T0 + 500 * HOUR_MS).toISOString()}`)).body;
      expect(body.storedModelCount).toBe(3);
      expect(body.storedModels[0]).toMatchObject({ modelCode: late!.modelCode, status: 'over_limit' });
      expect(body.storedModels.slice(1).map((s: { status: string }) => s.status)).toEqual(['past_forecast', 'past_forecast']);
      const none = (await viewer.get(`/v1/trends/edge-aging?batch=${batch.code}&to=${new Date(TREND_T0 + 3 * HOUR_MS).toISOString()}`)).body;
      expect(none.fit).toMatchObject({ defined: false });
      expect(none.storedModels.every((s: { status: string }) => s.status === 'no_forecast' || s.status === 'over_limit')).toBe(true);
    }));
});
