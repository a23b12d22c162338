import { describe, expect, it } from 'vitest';
import { forecastStoredModels, type StoredModel } from '../../../../db/operations/trends/forecastStoredModels.ts';
import type { LimitForecast } from '../../../../src/statistics/forecastLimitCrossing.ts';

const machined = Date.parse('2026-11-01T00:00:00Z');
const model = (code: string, over: Partial<StoredModel> = {}): StoredModel => ({
  modelId: code, modelCode: code, machiningMethod: 'milling', machinedAt: new Date(machined).toISOString(), machinedMs: machined, latestOrder: 0.08, latestObservedAt: null, ...over,
});
const forecast: LimitForecast = { reached: 'forecast', testBeforeH: { value: 240, uncertainty: 20 }, band95H: { lowerH: 200, upperH: 285 }, withinObservedRange: true };

describe('forecastStoredModels', () => {
  it('dates the crossing from each model\'s own machining time (hand-computed calendar arithmetic [C])', () => {
    const [only] = forecastStoredModels([model('UN-07')], forecast, 0.2, Date.parse('2026-11-05T00:00:00Z'));
    // 240 h after 1 Nov 00:00 is 11 Nov 00:00; 200 h is 9 Nov 08:00; 285 h is 12 Nov 21:00.
    expect(only).toMatchObject({
      hoursSinceMachining: 96,
      status: 'forecast',
      testBeforeAt: '2026-11-11T00:00:00.000Z',
      band95: { earliestAt: '2026-11-09T08:00:00.000Z', latestAt: '2026-11-12T21:00:00.000Z' },
      hoursRemaining: 144,
    });
  });

  it('puts models over their limit first, then the soonest, and past forecasts before future ones', () => {
    const later = model('B', { machinedMs: machined + 48 * 3_600_000 });
    const result = forecastStoredModels([later, model('A'), model('C', { latestOrder: 0.25 })], forecast, 0.2, Date.parse('2026-11-12T00:00:00Z'));
    expect(result.map((f) => [f.modelCode, f.status])).toEqual([['C', 'over_limit'], ['A', 'past_forecast'], ['B', 'forecast']]);
  });

  it('gives no date when the pooled curve does not forecast, and keeps an unbounded band open', () => {
    const never: LimitForecast = { reached: 'never', reason: 'the fitted slope is not positive' };
    expect(forecastStoredModels([model('A')], never, 0.2, machined)[0]).toMatchObject({ status: 'no_forecast', testBeforeAt: null, hoursRemaining: null });
    const open: LimitForecast = { ...forecast, band95H: { lowerH: 200, upperH: null } } as LimitForecast;
    expect(forecastStoredModels([model('A')], open, 0.2, machined)[0]!.band95).toEqual({ earliestAt: '2026-11-09T08:00:00.000Z', latestAt: null });
  });
});
