import { requireNumber } from '../guards/requireNumber.ts';
import type { AnnealingPlan } from './AnnealingPlan.ts';
import type { OvenLogComparison, OvenLogFinding, OvenLogSample, OvenLogTolerances } from './OvenLogComparison.ts';
import { findLogGaps } from './findLogGaps.ts';
import { findRateExcursions } from './findRateExcursions.ts';
import { measureSoakHolds } from './measureSoakHolds.ts';
import { normaliseOvenLog } from './normaliseOvenLog.ts';
import { plannedTemperatures } from './plannedTemperatures.ts';

/** Working defaults (common practice for air-circulating ovens with a 1–5 min logger). */
const DEFAULTS: OvenLogTolerances = {
  deviationC: 3,
  rateWindowH: 0.5,
  rateToleranceCPerH: 2,
  rateToleranceFraction: 0.1,
  soakBandC: 2,
  soakShortfallH: 0.1,
  overshootC: 2,
  maxGapH: 0.25,
};

/**
 * Compares what the oven did (a time/temperature log whose first sample is the start of the
 * cycle) with the plan: deviation from the planned curve, rolling ramp rates, soak time held,
 * overshoot above the plan's highest temperature, gaps and an early end of the log. Any fault
 * fails the run; remarks alone pass it with remarks. Linear in the number of samples.
 *
 * @example
 * // 6 mm cast acrylic plan (23→80 °C at 30 °C/h, 6 h soak, 80→49 °C at 30 °C/h); a log
 * // sampled every 0.1 h that follows it to 0.1 °C:
 * compareOvenLog(plan, log);
 * // { verdict: 'pass', findings: [], maxAbsDeviationC: 0.0, rmsDeviationC: 0.0,
 * //   soakHolds: [{ segmentNumber: 2, temperatureC: 80, plannedH: 6, heldH: 6, fromH: 1.9, toH: 7.9 }], ... }
 */
export function compareOvenLog(
  plan: Pick<AnnealingPlan, 'segments'>,
  log: readonly OvenLogSample[],
  tolerances: Partial<OvenLogTolerances> = {},
): OvenLogComparison {
  const tol: OvenLogTolerances = { ...DEFAULTS, ...tolerances };
  for (const [name, value] of Object.entries(tol)) requireNumber(`tolerances.${name}`, value, { min: 0 });
  requireNumber('tolerances.rateWindowH', tol.rateWindowH, { above: 0 });
  const { elapsedH, temperatureC } = normaliseOvenLog(log);
  const segments = plan.segments;
  const planEndH = segments.reduce((end, s) => Math.max(end, s.startH + s.durationH), 0);
  const expectedC = plannedTemperatures(segments, elapsedH);
  const findings: OvenLogFinding[] = [];

  let maxAbs = 0;
  let maxAt: number | null = null;
  let sumSquares = 0;
  let compared = 0;
  let peakC = -Infinity;
  let peakAt = 0;
  for (let i = 0; i < elapsedH.length; i += 1) {
    const e = expectedC[i];
    if (e === null || e === undefined) continue;
    const d = temperatureC[i]! - e;
    compared += 1;
    sumSquares += d * d;
    if (Math.abs(d) > maxAbs) [maxAbs, maxAt] = [Math.abs(d), elapsedH[i]!];
    if (temperatureC[i]! > peakC) [peakC, peakAt] = [temperatureC[i]!, elapsedH[i]!];
  }
  if (maxAt !== null && maxAbs > tol.deviationC) {
    findings.push({
      kind: 'deviation', severity: 'remark', atH: maxAt, untilH: null,
      message: `The oven strayed up to ${maxAbs.toFixed(1)} °C from the planned curve (at ${maxAt.toFixed(2)} h); allowed ${tol.deviationC} °C.`,
      numbers: { maxAbsDeviationC: maxAbs, deviationC: tol.deviationC },
    });
  }
  const planMaxC = Math.max(...segments.map((s) => Math.max(s.startTemperatureC, s.endTemperatureC)));
  if (peakC > planMaxC + tol.overshootC) {
    findings.push({
      kind: 'overshoot', severity: 'fault', atH: peakAt, untilH: null,
      message: `The oven reached ${peakC.toFixed(1)} °C at ${peakAt.toFixed(2)} h, ${(peakC - planMaxC).toFixed(1)} °C above the plan's ${planMaxC} °C: check the models for distortion.`,
      numbers: { peakC, planMaxC, overshootC: peakC - planMaxC },
    });
  }
  findings.push(...findRateExcursions(elapsedH, temperatureC, segments, tol));
  const soakHolds = measureSoakHolds(elapsedH, temperatureC, segments, tol.soakBandC);
  for (const h of soakHolds) {
    if (h.heldH < h.plannedH - tol.soakShortfallH) {
      const seg = segments.find((s) => s.number === h.segmentNumber)!;
      findings.push({
        kind: 'soak_short', severity: 'fault', atH: h.fromH ?? seg.startH, untilH: h.toH,
        message: `Soak ${h.segmentNumber} at ${h.temperatureC} °C was held ${h.heldH.toFixed(2)} h within ±${tol.soakBandC} °C; planned ${h.plannedH.toFixed(2)} h.`,
        numbers: { heldH: h.heldH, plannedH: h.plannedH, shortfallH: h.plannedH - h.heldH },
      });
    }
  }
  findings.push(...findLogGaps(elapsedH, tol.maxGapH));
  const lastH = elapsedH[elapsedH.length - 1]!;
  if (lastH < planEndH - tol.maxGapH) {
    findings.push({
      kind: 'log_ends_early', severity: 'remark', atH: lastH, untilH: planEndH,
      message: `The log ends at ${lastH.toFixed(2)} h, ${(planEndH - lastH).toFixed(2)} h before the plan does: the rest of the cycle is unverified.`,
      numbers: { lastSampleH: lastH, planEndH },
    });
  }
  findings.sort((a, b) => a.atH - b.atH);
  const faults = findings.filter((f) => f.severity === 'fault');
  const remarks = findings.filter((f) => f.severity === 'remark');
  return {
    sampleCount: elapsedH.length,
    elapsedH,
    expectedC,
    maxAbsDeviationC: maxAbs,
    maxDeviationAtH: maxAt,
    rmsDeviationC: compared > 0 ? Math.sqrt(sumSquares / compared) : 0,
    soakHolds,
    findings,
    verdict: faults.length > 0 ? 'fail' : remarks.length > 0 ? 'pass_with_remarks' : 'pass',
    reasons: findings.length > 0 ? [...faults, ...remarks].map((f) => f.message) : ['The log follows the plan within every tolerance.'],
    tolerances: tol,
  };
}
