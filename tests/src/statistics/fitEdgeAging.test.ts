import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { DomainError } from '../../../src/errors/DomainError.ts';
import { fitEdgeAging, type EdgeAgingFit } from '../../../src/statistics/fitEdgeAging.ts';

// Invented storage series: hours since machining and a deterministic ±0.003 fringe wobble.
const hoursGrid = [0, 2, 6, 12, 24, 48, 72, 120, 168, 240, 336];
const wobble = (i: number): number => 0.003 * Math.sin(1.7 * i + 0.4);
const pointsFrom = (order: (h: number) => number, hours = hoursGrid) =>
  hours.map((h, i) => ({ hoursSinceMachining: h, residualOrder: order(h) + wobble(i) }));

const fitted = (result: ReturnType<typeof fitEdgeAging>): EdgeAgingFit => {
  if (!result.defined) throw new Error(result.reason);
  return result;
};

describe('fitEdgeAging', () => {
  it('prefers √t for diffusion-like growth and forecasts the limit crossing', () => {
    const fit = fitted(fitEdgeAging(pointsFrom((h) => 0.02 + 0.012 * Math.sqrt(h)), { limitOrder: 0.3 }));
    expect(fit.chosen).toBe('sqrtTime');
    expect(fit.deltaAic).toBeGreaterThan(2);
    expect(fit.sqrtTime.timeScale === 'sqrtTime' && fit.sqrtTime.slopeOrderPerSqrtH.value).toBeCloseTo(0.012, 3);
    // (0.3 − 0.02)/0.012 = 23.33 √h, i.e. about 544 h [C]
    expect(fit.forecast).toMatchObject({ reached: 'forecast', withinObservedRange: false });
    expect(fit.forecast.reached === 'forecast' && fit.forecast.testBeforeH.value).toBeGreaterThan(500);
    expect(fit.forecast.reached === 'forecast' && fit.forecast.testBeforeH.value).toBeLessThan(590);
  });
  it('prefers the straight line when growth is linear in time', () => {
    const fit = fitted(fitEdgeAging(pointsFrom((h) => 0.05 + 0.0006 * h), { limitOrder: 0.2 }));
    expect(fit.chosen).toBe('linearTime');
    expect(fit.selectionReason).toMatch(/lower AIC/);
    expect(fit.linearTime.rSquared).toBeGreaterThan(fit.sqrtTime.rSquared!);
  });
  it('keeps √t with a reason when points are too few or the models tie', () => {
    const few = fitted(fitEdgeAging(pointsFrom((h) => 0.05 + 0.0006 * h, [0, 24, 96, 200]), { limitOrder: 0.3 }));
    expect(few.chosen).toBe('sqrtTime');
    expect(few.selectionReason).toMatch(/fewer than 6 points/);
    // with only two distinct times both models pass through the same two means: a tie
    const twoTimes = [10, 10, 10, 90, 90, 90].map((h, i) => ({ hoursSinceMachining: h, residualOrder: 0.05 + h / 1000 + wobble(i) }));
    const tie = fitted(fitEdgeAging(twoTimes, { limitOrder: 0.3 }));
    expect(tie.deltaAic).toBeCloseTo(0, 6);
    expect(tie.chosen).toBe('sqrtTime');
    expect(tie.selectionReason).toMatch(/no real preference/);
  });
  it('forecast time, plugged back into the chosen line, gives the limit', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 0.08, noNaN: true }),
        fc.double({ min: 0.002, max: 0.03, noNaN: true }),
        fc.double({ min: 0.1, max: 1, noNaN: true }),
        (a, b, limit) => {
          const fit = fitted(fitEdgeAging(pointsFrom((h) => a + b * Math.sqrt(h)), { limitOrder: limit }));
          const model = fit.chosen === 'sqrtTime' ? fit.sqrtTime : fit.linearTime;
          const slope = model.timeScale === 'sqrtTime' ? model.slopeOrderPerSqrtH.value : model.slopeOrderPerH.value;
          if (fit.forecast.reached !== 'forecast') return;
          const t = fit.forecast.testBeforeH.value;
          const axis = model.timeScale === 'sqrtTime' ? Math.sqrt(t) : t;
          expect(model.interceptOrder.value + slope * axis).toBeCloseTo(limit, 9);
        },
      ),
    );
  });
  it('is undefined with fewer than 3 points or one storage time; refuses negative hours', () => {
    expect(fitEdgeAging(pointsFrom(() => 0.1, [0, 10]), { limitOrder: 0.2 }).defined).toBe(false);
    expect(fitEdgeAging(pointsFrom(() => 0.1, [5, 5, 5]), { limitOrder: 0.2 }).defined).toBe(false);
    expect(() => fitEdgeAging(pointsFrom(() => 0.1, [-1, 5, 9]), { limitOrder: 0.2 })).toThrow(DomainError);
  });
});
