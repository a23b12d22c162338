import { requireNumber } from '../guards/requireNumber.ts';
import type { Measured } from '../uncertainty/Measured.ts';
import type { LineFit } from './ordinaryLeastSquaresLine.ts';
import { studentTQuantile } from './studentTQuantile.ts';

/** The time axis a line was fitted on: N = a + b·√t or N = a + b·t. */
export type TimeScale = 'sqrtTime' | 'linearTime';

export type LimitForecast =
  | {
      reached: 'forecast';
      /** Time since machining at which the fitted line reaches the limit, with u(t) by the delta method. */
      testBeforeH: Measured;
      /**
       * ≈95 % band: the delta-method interval on the fitted axis (Student t, n − 2 degrees of
       * freedom) mapped back to hours. upperH is null when the slope's own 95 % interval
       * reaches zero: the line may then never get to the limit.
       */
      band95H: { lowerH: number; upperH: number | null };
      /** False when the forecast extrapolates beyond the latest observation. */
      withinObservedRange: boolean;
    }
  | { reached: 'already'; reason: string }
  | { reached: 'never'; reason: string };

const toHours = (scale: TimeScale, g: number): number => (scale === 'sqrtTime' ? g * g : g);

/**
 * When does a fitted aging line N = a + b·g(t), g = √t or t, reach `limitOrder`? Solves
 * g* = (L − a)/b and propagates the coefficient covariance by the delta method:
 * u²(g*) = (u²(a) + 2g*·Cov(a, b) + g*²·u²(b))/b², then u(t) = |dt/dg|·u(g*).
 * `already` when the line starts at or above the limit (t = 0); `never` when its slope is
 * not positive.
 *
 * @example
 * // fit: a = 0.02 ± 0.01, b = 0.01 ± 0.001 per √h, Cov = −8e-6, n = 8, latest point 400 h
 * forecastLimitCrossing(fit, 0.2, 'sqrtTime', 400);
 * // { reached: 'forecast', testBeforeH: { value: 324, uncertainty: 41.98 },
 * //   band95H: { lowerH: 229.4, upperH: 434.9 }, withinObservedRange: true }
 */
export function forecastLimitCrossing(
  fit: LineFit,
  limitOrder: number,
  scale: TimeScale,
  latestObservedH: number,
): LimitForecast {
  requireNumber('limitOrder', limitOrder);
  requireNumber('latestObservedH', latestObservedH, { min: 0 });
  const a = fit.intercept.value;
  const b = fit.slope.value;
  if (a >= limitOrder) {
    return { reached: 'already', reason: `the fitted line starts at ${a.toPrecision(3)}, at or above the limit ${limitOrder}` };
  }
  if (!(b > 0)) {
    return { reached: 'never', reason: `the fitted slope ${b.toPrecision(3)} is not positive: the residual is not growing` };
  }
  const g = (limitOrder - a) / b;
  const varianceG =
    (fit.intercept.uncertainty ** 2 + 2 * g * fit.covarianceInterceptSlope + g * g * fit.slope.uncertainty ** 2) / (b * b);
  const uG = Math.sqrt(Math.max(0, varianceG));
  const k = studentTQuantile(0.975, fit.n - 2);
  const slopeReachesZero = b - k * fit.slope.uncertainty <= 0;
  const hours = toHours(scale, g);
  return {
    reached: 'forecast',
    testBeforeH: { value: hours, uncertainty: (scale === 'sqrtTime' ? 2 * g : 1) * uG },
    band95H: {
      lowerH: toHours(scale, Math.max(0, g - k * uG)),
      upperH: slopeReachesZero ? null : toHours(scale, g + k * uG),
    },
    withinObservedRange: hours <= latestObservedH,
  };
}
