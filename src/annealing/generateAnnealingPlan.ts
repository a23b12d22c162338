import { DomainError } from '../errors/DomainError.ts';
import { requireNumber } from '../guards/requireNumber.ts';
import type { AnnealingPlan, PlanPreStep } from './AnnealingPlan.ts';
import type { OvenLimits, PlanDraft } from './PlanDraft.ts';
import { addSources } from './addSources.ts';
import { appendRamp } from './appendRamp.ts';
import { appendSoak } from './appendSoak.ts';
import { dryingDuration } from './dryingDuration.ts';
import { ANNEALING_CAUTIONS } from './guidanceCatalogue.ts';
import { resolveRampRate } from './resolveRampRate.ts';
import { resolveTemperatureTarget } from './resolveTemperatureTarget.ts';
import { soakRuleDuration } from './soakRuleDuration.ts';
import { validateGuidanceEntry } from './validateGuidanceEntry.ts';

export interface AnnealingPlanRequest {
  /** A catalogue entry or a lab's own entry of the same shape (validated here). */
  guidance: unknown;
  maxSectionThicknessMm: number;
  startTemperatureC?: number;
  ovenLimits?: OvenLimits;
  /** How close the centre must come to a soak temperature, °C (common practice: 1 °C). */
  soakToleranceC?: number;
  /** h·L/k of the model in the oven; omitted: surface follows the oven temperature (Bi → ∞). */
  surfaceBiot?: number;
  catalogueVersion?: string;
}

/**
 * Builds a ramp-and-soak oven plan for one model from a guidance entry and the model's
 * thickest section, with a slab thermal check of every ramp, soak equilibration times, the
 * sources of every number used, and the safety cautions.
 *
 * @example
 * generateAnnealingPlan({ guidance: CAST_ACRYLIC_GUIDANCE, maxSectionThicknessMm: 6 });
 * // segments: ramp 23→80 °C at 30 °C/h (1.9 h); soak 80 °C 6 h; ramp 80→49 °C at 30 °C/h (1.033 h)
 * // totalDurationH: 8.933, warnings: [], cautions: [...6 items]
 */
export function generateAnnealingPlan(request: AnnealingPlanRequest): AnnealingPlan {
  const guidance = validateGuidanceEntry(request.guidance);
  const thicknessMm = requireNumber('maxSectionThicknessMm', request.maxSectionThicknessMm, { above: 0, max: 500 });
  const startC = requireNumber('startTemperatureC', request.startTemperatureC ?? 23, { min: -40, max: 60 });
  const soakToleranceC = requireNumber('soakToleranceC', request.soakToleranceC ?? 1, { above: 0, max: 20 });
  const biot = request.surfaceBiot === undefined ? Number.POSITIVE_INFINITY : requireNumber('surfaceBiot', request.surfaceBiot, { above: 0 });
  const ovenLimits = request.ovenLimits ?? {};
  for (const [name, value] of Object.entries(ovenLimits)) {
    if (value !== undefined) requireNumber(`ovenLimits.${name}`, value, { above: 0 });
  }
  const draft: PlanDraft = {
    thicknessMm,
    halfThicknessMm: thicknessMm / 2,
    diffusivityMm2PerS: guidance.thermalDiffusivityMm2PerS.value,
    allowedGradientC: guidance.allowedGradientC.value,
    soakToleranceC,
    biot,
    ovenLimits,
    temperatureC: startC,
    elapsedH: 0,
    pendingLagC: 0,
    segments: [],
    rampChecks: [],
    soakChecks: [],
    warnings: [],
    notes: [
      `L = ${thicknessMm / 2} mm: half the ${thicknessMm} mm section, taken as heated from both faces.`,
      biot === Number.POSITIVE_INFINITY
        ? 'The model surface is taken to follow the oven temperature (Bi → ∞); thin air flow makes the real lag larger.'
        : `Surface heat transfer Bi = ${biot}: equilibration counts the surface's own lag behind the oven air.`,
      `Soak equilibration: one-term slab solution from a uniform difference equal to the ramp lag (conservative); tolerance ${soakToleranceC} °C (common practice).`,
    ],
    sources: new Map(),
  };
  addSources(draft.sources, [guidance.thermalDiffusivityMm2PerS.source, guidance.allowedGradientC.source]);
  const section = { thicknessMm, halfThicknessMm: draft.halfThicknessMm, diffusivityMm2PerS: draft.diffusivityMm2PerS, allowedGradientC: draft.allowedGradientC };
  const target = (t: Parameters<typeof resolveTemperatureTarget>[0]) => {
    const resolved = resolveTemperatureTarget(t, startC);
    addSources(draft.sources, resolved.sources);
    return resolved;
  };

  const soakTarget = target(guidance.soak.temperature);
  if (!(soakTarget.temperatureC > startC)) {
    throw new DomainError('invalid_input', `startTemperatureC ${startC} °C is not below the soak temperature ${soakTarget.temperatureC} °C`, [
      { field: 'startTemperatureC', message: `must be below the soak temperature ${soakTarget.temperatureC} °C` },
    ]);
  }
  for (const stage of guidance.heating) {
    const to = target(stage.to);
    appendRamp(draft, { toC: to.temperatureC, rate: resolveRampRate(stage.rate, section), label: `heat to ${to.description}` });
    if (stage.hold) appendSoak(draft, { rule: soakRuleDuration(stage.hold, thicknessMm), label: `hold at ${to.description}` });
  }
  appendRamp(draft, { toC: soakTarget.temperatureC, rate: resolveRampRate(guidance.heatingRateToSoak, section), label: `heat to soak (${soakTarget.description})` });
  appendSoak(draft, { rule: soakRuleDuration(guidance.soak.time, thicknessMm), label: `soak at ${soakTarget.description}` });
  for (const stage of guidance.cooling) {
    const to = target(stage.to);
    const rule = stage.minimumDuration;
    const applies = rule !== undefined && thicknessMm > rule.appliesAboveThicknessMm.value;
    if (rule !== undefined && applies) addSources(draft.sources, [rule.hoursPerMm.source, rule.appliesAboveThicknessMm.source]);
    appendRamp(draft, {
      toC: to.temperatureC,
      rate: resolveRampRate(stage.rate, section),
      label: `cool to ${to.description}`,
      ...(rule !== undefined && applies ? { minimumDurationH: rule.hoursPerMm.value * thicknessMm } : {}),
    });
  }

  const preSteps: PlanPreStep[] = (guidance.preSteps ?? []).map((p) => {
    const d = dryingDuration(p, thicknessMm);
    addSources(draft.sources, [p.source, p.temperatureC.source]);
    if (d.extrapolated) {
      draft.warnings.push({ kind: 'beyond_table', segmentNumber: null, message: d.note, numbers: { thicknessMm, dryingH: d.durationH } });
    }
    return { kind: 'drying', temperatureC: p.temperatureC.value, durationH: d.durationH, note: d.note, sources: [p.source] };
  });
  const maxTemperatureC = Math.max(...draft.segments.map((s) => s.endTemperatureC), ...preSteps.map((p) => p.temperatureC));
  const ovenMax = ovenLimits.maxTemperatureC;
  if (ovenMax !== undefined && maxTemperatureC > ovenMax) {
    throw new DomainError('precondition_failed', `the plan needs ${maxTemperatureC} °C, above the oven's ${ovenMax} °C`, [
      { field: 'ovenLimits.maxTemperatureC', message: `plan reaches ${maxTemperatureC} °C` },
    ]);
  }
  return {
    guidanceKey: guidance.key,
    guidanceTitle: guidance.title,
    catalogueVersion: request.catalogueVersion ?? null,
    maxSectionThicknessMm: thicknessMm,
    halfThicknessMm: draft.halfThicknessMm,
    diffusivityMm2PerS: draft.diffusivityMm2PerS,
    allowedGradientC: draft.allowedGradientC,
    soakToleranceC,
    surfaceBiot: biot === Number.POSITIVE_INFINITY ? null : biot,
    startTemperatureC: startC,
    maxTemperatureC,
    preSteps,
    segments: draft.segments,
    totalDurationH: draft.segments.reduce((sum, s) => sum + s.durationH, 0),
    rampChecks: draft.rampChecks,
    soakChecks: draft.soakChecks,
    warnings: draft.warnings,
    notes: [...draft.notes, ...(guidance.notes ?? [])],
    sources: [...draft.sources.values()],
    cautions: [...ANNEALING_CAUTIONS],
  };
}
