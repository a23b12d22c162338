import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { forecastLimitCrossing, type TimeScale } from '../../../src/statistics/forecastLimitCrossing.ts';
import type { LineFit } from '../../../src/statistics/ordinaryLeastSquaresLine.ts';

const line = (a: number, b: number, ua = 0.01, ub = 0.001, cov = -5e-6, n = 8): LineFit => ({
  defined: true,
  n,
  intercept: { value: a, uncertainty: ua },
  slope: { value: b, uncertainty: ub },
  covarianceInterceptSlope: cov,
  residualSumOfSquares: 0.001,
  residualStandardError: 0.01,
  rSquared: 0.98,
  adjustedRSquared: 0.977,
});

const toAxis = (scale: TimeScale, hours: number): number => (scale === 'sqrtTime' ? Math.sqrt(hours) : hours);
const scale = fc.constantFrom<TimeScale>('sqrtTime', 'linearTime');

describe('forecastLimitCrossing', () => {
  it('returns a time that, plugged back into the line, gives the limit', () => {
    fc.assert(
      fc.property(
        scale,
        fc.double({ min: 0, max: 0.1, noNaN: true }),
        fc.double({ min: 1e-4, max: 0.05, noNaN: true }),
        fc.double({ min: 0.11, max: 2, noNaN: true }),
        (s, a, b, limit) => {
          const forecast = forecastLimitCrossing(line(a, b), limit, s, 100);
          if (forecast.reached !== 'forecast') throw new Error(forecast.reached);
          expect(a + b * toAxis(s, forecast.testBeforeH.value)).toBeCloseTo(limit, 10);
          expect(forecast.band95H.lowerH).toBeLessThanOrEqual(forecast.testBeforeH.value);
        },
      ),
    );
  });
  it('propagates the covariance as a numerical gradient of t(a, b) does (delta method) [C]', () => {
    const fit = line(0.02, 0.01, 0.01, 0.001, -8e-6);
    const hoursAt = (a: number, b: number): number => ((0.2 - a) / b) ** 2;
    const h = 1e-7;
    const da = (hoursAt(0.02 + h, 0.01) - hoursAt(0.02 - h, 0.01)) / (2 * h);
    const db = (hoursAt(0.02, 0.01 + h) - hoursAt(0.02, 0.01 - h)) / (2 * h);
    const expected = Math.sqrt(da * da * 1e-4 + 2 * da * db * -8e-6 + db * db * 1e-6);
    const forecast = forecastLimitCrossing(fit, 0.2, 'sqrtTime', 400);
    if (forecast.reached !== 'forecast') throw new Error(forecast.reached);
    expect(forecast.testBeforeH.value).toBeCloseTo(324, 10);
    expect(forecast.testBeforeH.uncertainty).toBeCloseTo(expected, 5);
    expect(forecast.withinObservedRange).toBe(true);
    // on the √t axis the band is symmetric; squared back to hours it is not
    expect(forecast.band95H.upperH! - 324).toBeGreaterThan(324 - forecast.band95H.lowerH);
  });
  it('says "already" when the line starts at the limit and "never" for a flat or falling line', () => {
    expect(forecastLimitCrossing(line(0.3, 0.01), 0.2, 'sqrtTime', 50).reached).toBe('already');
    expect(forecastLimitCrossing(line(0.05, 0), 0.2, 'linearTime', 50).reached).toBe('never');
    expect(forecastLimitCrossing(line(0.05, -0.001), 0.2, 'linearTime', 50).reached).toBe('never');
  });
  it('leaves the band open above when the slope is not distinguishable from zero', () => {
    const forecast = forecastLimitCrossing(line(0.02, 0.001, 0.01, 0.002), 0.2, 'linearTime', 50);
    expect(forecast).toMatchObject({ reached: 'forecast', band95H: { upperH: null }, withinObservedRange: false });
  });
});
