import type { SourceRef } from './AnnealingGuidance.ts';
import type { AnnealingPlan } from './AnnealingPlan.ts';

export interface OvenLimits {
  maxTemperatureC?: number;
  maxHeatingRateCPerH?: number;
  maxCoolingRateCPerH?: number;
  minRateCPerH?: number;
}

/** A plan while it is being built, with the running state the builders share. */
export interface PlanDraft
  extends Pick<AnnealingPlan, 'segments' | 'rampChecks' | 'soakChecks' | 'warnings' | 'notes'> {
  thicknessMm: number;
  halfThicknessMm: number;
  diffusivityMm2PerS: number;
  allowedGradientC: number;
  soakToleranceC: number;
  biot: number;
  ovenLimits: OvenLimits;
  temperatureC: number;
  elapsedH: number;
  /** Centre-to-oven difference left by the last ramp, which the next soak must remove. */
  pendingLagC: number;
  sources: Map<string, SourceRef>;
}
