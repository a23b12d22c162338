import type { PlanDraft } from '../../../../src/annealing/PlanDraft.ts';

/** A fresh plan draft for one section, as generateAnnealingPlan starts it, with the running state overridable. */
export function draftFor(overrides: Partial<PlanDraft> & Pick<PlanDraft, 'thicknessMm' | 'diffusivityMm2PerS'>): PlanDraft {
  return {
    halfThicknessMm: overrides.thicknessMm / 2,
    allowedGradientC: 2,
    soakToleranceC: 1,
    biot: Number.POSITIVE_INFINITY,
    ovenLimits: {},
    temperatureC: 23,
    elapsedH: 0,
    pendingLagC: 0,
    segments: [],
    rampChecks: [],
    soakChecks: [],
    warnings: [],
    notes: [],
    sources: new Map(),
    ...overrides,
  };
}
