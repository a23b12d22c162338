import { requireNumber } from '../guards/requireNumber.ts';
import type { Measured } from '../uncertainty/Measured.ts';
import { forecastLimitCrossing, type LimitForecast, type TimeScale } from './forecastLimitCrossing.ts';
import { ordinaryLeastSquaresLine, type LineFit } from './ordinaryLeastSquaresLine.ts';

export interface EdgeAgingPoint {
  hoursSinceMachining: number;
  residualOrder: number;
}

interface ModelFitCommon {
  interceptOrder: Measured;
  covarianceInterceptSlope: number;
  rSquared: number | null;
  adjustedRSquared: number | null;
  residualStandardErrorOrder: number;
  /** n·ln(RSS/n) + 2·3 (a, b and the residual variance). */
  aic: number;
  forecast: LimitForecast;
}

export type EdgeAgingModelFit =
  | ({ timeScale: 'sqrtTime'; equation: 'N = a + b·√t'; slopeOrderPerSqrtH: Measured } & ModelFitCommon)
  | ({ timeScale: 'linearTime'; equation: 'N = a + b·t'; slopeOrderPerH: Measured } & ModelFitCommon);

export interface EdgeAgingFit {
  defined: true;
  pointCount: number;
  chosen: TimeScale;
  /** AIC(linear) − AIC(√t): positive favours √t. */
  deltaAic: number;
  selectionReason: string;
  sqrtTime: EdgeAgingModelFit;
  linearTime: EdgeAgingModelFit;
  /** The chosen model's forecast, repeated for convenience. */
  forecast: LimitForecast;
}

// Both models have the same parameter count, so AIC, RSS, R² and adjusted R² all rank them
// alike; AIC is used because |ΔAIC| < 2 is the usual threshold for "no real preference"
// (Burnham & Anderson, Model Selection and Multimodel Inference [M]).
const AIC_TIE = 2;
// With fewer points the two curves differ by less than typical scatter: a project choice.
const MIN_POINTS_TO_SELECT = 6;

function describe(scale: TimeScale, fit: LineFit, limitOrder: number, latestH: number): EdgeAgingModelFit {
  const common: ModelFitCommon = {
    interceptOrder: fit.intercept,
    covarianceInterceptSlope: fit.covarianceInterceptSlope,
    rSquared: fit.rSquared,
    adjustedRSquared: fit.adjustedRSquared,
    residualStandardErrorOrder: fit.residualStandardError,
    // A floor keeps a perfect fit's AIC finite (and JSON-safe) while still ranking it best.
    aic: fit.n * Math.log(Math.max(fit.residualSumOfSquares, Number.MIN_VALUE) / fit.n) + 6,
    forecast: forecastLimitCrossing(fit, limitOrder, scale, latestH),
  };
  return scale === 'sqrtTime'
    ? { timeScale: scale, equation: 'N = a + b·√t', slopeOrderPerSqrtH: fit.slope, ...common }
    : { timeScale: scale, equation: 'N = a + b·t', slopeOrderPerH: fit.slope, ...common };
}

/**
 * Growth of an edge residual with storage time (time-edge effect). Fits N = a + b·√t
 * (diffusion-driven: the moisture-affected layer grows as √(D·t)) and N = a + b·t by ordinary
 * least squares, keeps the one with the lower AIC, and forecasts when the fitted line
 * reaches `limitOrder`: the "test before" time with a delta-method band. With |ΔAIC| < 2 or
 * fewer than 6 points the data cannot tell the models apart and √t is kept, as the physics
 * expects. Fewer than 3 points or a single time give `{ defined: false }`.
 *
 * @example
 * fitEdgeAging(
 *   [[0, 0.02], [4, 0.05], [16, 0.07], [36, 0.1], [64, 0.13], [100, 0.15], [144, 0.18]]
 *     .map(([h, n]) => ({ hoursSinceMachining: h, residualOrder: n })),
 *   { limitOrder: 0.25 },
 * );
 * // { chosen: 'sqrtTime', deltaAic: 25.1, sqrtTime: { slopeOrderPerSqrtH: { value: 0.013214,
 * //   uncertainty: 0.000277 }, ... }, forecast: { reached: 'forecast',
 * //   testBeforeH: { value: 301.1, uncertainty: 8.74 }, band95H: { lowerH: 279.0,
 * //   upperH: 324.0 }, withinObservedRange: false }, ... }
 */
export function fitEdgeAging(
  points: readonly EdgeAgingPoint[],
  { limitOrder }: { limitOrder: number },
): EdgeAgingFit | { defined: false; reason: string } {
  requireNumber('limitOrder', limitOrder);
  const hours = points.map((p, i) => requireNumber(`points[${i}].hoursSinceMachining`, p.hoursSinceMachining, { min: 0 }));
  const orders = points.map((p, i) => requireNumber(`points[${i}].residualOrder`, p.residualOrder));
  const sqrtFit = ordinaryLeastSquaresLine(hours.map(Math.sqrt), orders);
  const linearFit = ordinaryLeastSquaresLine(hours, orders);
  if (!sqrtFit.defined) return sqrtFit;
  if (!linearFit.defined) return linearFit;
  const latestH = Math.max(...hours);
  const sqrtTime = describe('sqrtTime', sqrtFit, limitOrder, latestH);
  const linearTime = describe('linearTime', linearFit, limitOrder, latestH);
  const deltaAic = linearTime.aic - sqrtTime.aic;
  let chosen: TimeScale = 'sqrtTime';
  let selectionReason: string;
  if (points.length < MIN_POINTS_TO_SELECT) {
    selectionReason = `fewer than ${MIN_POINTS_TO_SELECT} points cannot tell the models apart: √t kept as the diffusion-driven default`;
  } else if (Math.abs(deltaAic) < AIC_TIE) {
    selectionReason = `|ΔAIC| = ${Math.abs(deltaAic).toFixed(2)} < ${AIC_TIE}: no real preference, √t kept as the diffusion-driven default`;
  } else {
    chosen = deltaAic > 0 ? 'sqrtTime' : 'linearTime';
    selectionReason = `lower AIC by ${Math.abs(deltaAic).toFixed(2)} (equivalently lower residual sum of squares, both models having two coefficients)`;
  }
  return {
    defined: true,
    pointCount: points.length,
    chosen,
    deltaAic,
    selectionReason,
    sqrtTime,
    linearTime,
    forecast: (chosen === 'sqrtTime' ? sqrtTime : linearTime).forecast,
  };
}
