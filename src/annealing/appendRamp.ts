import type { PlanDraft } from './PlanDraft.ts';
import type { ResolvedRate } from './resolveRampRate.ts';
import { addSources } from './addSources.ts';
import { maxRateForAllowedLag } from './maxRateForAllowedLag.ts';
import { rampLagC } from './rampLagC.ts';
import { roundRateDownCPerH } from './roundRateDownCPerH.ts';

/**
 * Adds a ramp from the draft's current temperature to `toC`, applying a minimum duration rule
 * and the oven's rate limits, and checks its centre-to-surface lag against the allowed gradient.
 * Leaves the ramp's lag pending for the next soak to remove.
 *
 * @example
 * appendRamp(draft, { toC: 80, rate: { rateCPerH: 14, sources: [], notes: [], warnings: [] }, label: 'heat to soak' });
 * // draft at 23 °C, 12 mm: adds { kind: 'ramp', 23 → 80 °C, rateCPerH: 14, durationH: 4.071 }
 */
export function appendRamp(
  draft: PlanDraft,
  step: { toC: number; rate: ResolvedRate; label: string; minimumDurationH?: number },
): void {
  const fromC = draft.temperatureC;
  const spanC = Math.abs(step.toC - fromC);
  addSources(draft.sources, step.rate.sources);
  if (spanC === 0) {
    draft.notes.push(`${step.label}: already at ${fromC} °C, no ramp needed.`);
    return;
  }
  const heating = step.toC > fromC;
  const number = draft.segments.length + 1;
  draft.notes.push(...step.rate.notes.map((n) => `Segment ${number} (${step.label}): ${n}`));
  draft.warnings.push(...step.rate.warnings.map((w) => ({ ...w, segmentNumber: number })));
  let rate = step.rate.rateCPerH;
  if (step.minimumDurationH !== undefined && spanC / rate < step.minimumDurationH) {
    const slower = roundRateDownCPerH(spanC / step.minimumDurationH);
    draft.notes.push(
      `Segment ${number} (${step.label}): the time rule asks for at least ${step.minimumDurationH} h, so ${slower} °C/h is used instead of ${rate} °C/h (the slower rule governs).`,
    );
    rate = slower;
  }
  const ovenMax = heating ? draft.ovenLimits.maxHeatingRateCPerH : draft.ovenLimits.maxCoolingRateCPerH;
  if (ovenMax !== undefined && rate > ovenMax) {
    draft.notes.push(`Segment ${number} (${step.label}): limited to the oven's ${ovenMax} °C/h (planned ${rate} °C/h).`);
    rate = ovenMax;
  }
  const ovenMin = draft.ovenLimits.minRateCPerH;
  if (ovenMin !== undefined && rate < ovenMin) {
    const stepRampH = 1 / ovenMin;
    draft.warnings.push({
      kind: 'rate_below_oven_minimum',
      segmentNumber: number,
      message: `${rate} °C/h is slower than the oven's slowest ramp (${ovenMin} °C/h): program it as 1 °C steps, each a ramp at ${ovenMin} °C/h then a hold of ${((1 / rate - stepRampH) * 60).toFixed(0)} min.`,
      numbers: { rateCPerH: rate, ovenMinRateCPerH: ovenMin, stepC: 1, stepRampH, stepHoldH: 1 / rate - stepRampH },
    });
  }
  const durationH = spanC / rate;
  draft.segments.push({
    number,
    kind: 'ramp',
    label: step.label,
    startTemperatureC: fromC,
    endTemperatureC: step.toC,
    rateCPerH: rate,
    durationH,
    startH: draft.elapsedH,
  });
  const section = { halfThicknessMm: draft.halfThicknessMm, diffusivityMm2PerS: draft.diffusivityMm2PerS };
  const lagC = rampLagC({ rateCPerH: rate, ...section });
  const maxRateCPerH = maxRateForAllowedLag({ allowedLagC: draft.allowedGradientC, ...section });
  // A relative margin keeps a rate set exactly at the limit from warning through rounding error.
  const withinAllowed = lagC <= draft.allowedGradientC * (1 + 1e-9);
  draft.rampChecks.push({ segmentNumber: number, rateCPerH: rate, lagC, allowedGradientC: draft.allowedGradientC, withinAllowed, maxRateCPerH });
  if (!withinAllowed) {
    draft.warnings.push({
      kind: 'lag_exceeds_gradient',
      segmentNumber: number,
      message: `At ${rate} °C/h the centre lags the surface by about ${lagC.toFixed(2)} °C, more than the allowed ${draft.allowedGradientC} °C; ${roundRateDownCPerH(maxRateCPerH)} °C/h or slower keeps it.`,
      numbers: { rateCPerH: rate, lagC, allowedGradientC: draft.allowedGradientC, proposedRateCPerH: maxRateCPerH },
    });
  }
  // With a finite Biot number the surface itself trails the oven air by R·L²/(α·Bi). The
  // quasi-steady value is not reached on a short ramp, and the centre can never trail by more
  // than the ramp's span plus what it already trailed.
  draft.pendingLagC = Math.min(lagC * (1 + 2 / draft.biot), spanC + draft.pendingLagC);
  draft.elapsedH += durationH;
  draft.temperatureC = step.toC;
}
