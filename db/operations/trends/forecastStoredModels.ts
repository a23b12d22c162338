import type { LimitForecast } from '../../../src/statistics/forecastLimitCrossing.ts';

const HOUR_MS = 3_600_000;

export interface StoredModel {
  modelId: string;
  modelCode: string;
  machiningMethod: string | null;
  machinedAt: string;
  machinedMs: number;
  latestOrder: number | null;
  latestObservedAt: string | null;
}

export type StoredModelStatus = 'over_limit' | 'past_forecast' | 'forecast' | 'no_forecast';

export interface StoredModelForecast extends Omit<StoredModel, 'machinedMs'> {
  hoursSinceMachining: number;
  status: StoredModelStatus;
  testBeforeAt: string | null;
  band95: { earliestAt: string; latestAt: string | null } | null;
  hoursRemaining: number | null;
}

const atHours = (machinedMs: number, hours: number) => new Date(machinedMs + hours * HOUR_MS).toISOString();

/**
 * Puts each stored model on the pooled aging curve: the curve gives hours since machining at
 * which the limit is reached, the model's own machining time turns that into a date. A model
 * whose own latest reading already exceeds the limit is over it whatever the curve says.
 * Sorted soonest first; models without a date last.
 *
 * @example
 * forecastStoredModels(
 *   [{ modelId: 'm1', modelCode: 'UN-07', machiningMethod: 'milling', machinedAt: '2026-11-01T00:00:00.000Z',
 *      machinedMs: Date.parse('2026-11-01T00:00:00Z'), latestOrder: 0.08, latestObservedAt: '2026-11-03T00:00:00.000Z' }],
 *   { reached: 'forecast', testBeforeH: { value: 240, uncertainty: 20 }, band95H: { lowerH: 200, upperH: 285 }, withinObservedRange: true },
 *   0.2, Date.parse('2026-11-05T00:00:00Z'));
 * // [{ modelCode: 'UN-07', hoursSinceMachining: 96, status: 'forecast', testBeforeAt: '2026-11-11T00:00:00.000Z',
 * //    band95: { earliestAt: '2026-11-09T08:00:00.000Z', latestAt: '2026-11-12T21:00:00.000Z' }, hoursRemaining: 144, … }]
 */
export function forecastStoredModels(models: readonly StoredModel[], forecast: LimitForecast | null, limitOrder: number, atMs: number): StoredModelForecast[] {
  const forecasts = models.map(({ machinedMs, ...model }): StoredModelForecast => {
    const hoursSinceMachining = Math.max(0, (atMs - machinedMs) / HOUR_MS);
    const overNow = model.latestOrder !== null && model.latestOrder > limitOrder;
    if (forecast?.reached !== 'forecast') {
      return { ...model, hoursSinceMachining, status: overNow ? 'over_limit' : 'no_forecast', testBeforeAt: null, band95: null, hoursRemaining: null };
    }
    const hoursRemaining = forecast.testBeforeH.value - hoursSinceMachining;
    return {
      ...model,
      hoursSinceMachining,
      status: overNow ? 'over_limit' : hoursRemaining <= 0 ? 'past_forecast' : 'forecast',
      testBeforeAt: atHours(machinedMs, forecast.testBeforeH.value),
      band95: {
        earliestAt: atHours(machinedMs, forecast.band95H.lowerH),
        latestAt: forecast.band95H.upperH === null ? null : atHours(machinedMs, forecast.band95H.upperH),
      },
      hoursRemaining,
    };
  });
  const order = (f: StoredModelForecast) => (f.status === 'over_limit' ? -Infinity : (f.hoursRemaining ?? Infinity));
  return forecasts.sort((x, y) => order(x) - order(y) || x.modelCode.localeCompare(y.modelCode));
}
