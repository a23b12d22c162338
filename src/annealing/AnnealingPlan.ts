import type { SourceRef } from './AnnealingGuidance.ts';

/** One programmable oven step. Ramps carry a rate; soaks carry `rateCPerH: null`. */
export interface PlanSegment {
  /** 1-based, in running order. */
  number: number;
  kind: 'ramp' | 'soak';
  label: string;
  startTemperatureC: number;
  endTemperatureC: number;
  rateCPerH: number | null;
  durationH: number;
  /** Elapsed time at the start of the segment, from the start of the cycle. */
  startH: number;
}

export interface RampCheck {
  segmentNumber: number;
  rateCPerH: number;
  /** Quasi-steady centre-to-surface lag R·L²/(2α). */
  lagC: number;
  allowedGradientC: number;
  withinAllowed: boolean;
  /** The rate whose lag equals the allowed gradient exactly. */
  maxRateCPerH: number;
}

export interface SoakCheck {
  segmentNumber: number | null;
  temperatureC: number;
  ruleDurationH: number;
  /** Centre-to-oven difference when the soak begins (lag of the ramp before it). */
  initialDifferenceC: number;
  toleranceC: number;
  equilibrationH: number;
  fourier: number;
  oneTermValid: boolean;
  durationH: number;
  lengthenedBecause: string | null;
}

export type PlanWarningKind =
  | 'lag_exceeds_gradient'
  | 'rate_below_oven_minimum'
  | 'beyond_table'
  | 'soak_beyond_practice_band'
  | 'rate_limited_only_by_gradient';

export interface PlanWarning {
  kind: PlanWarningKind;
  segmentNumber: number | null;
  message: string;
  numbers: Record<string, number>;
}

export interface PlanPreStep {
  kind: 'drying';
  temperatureC: number;
  durationH: number;
  note: string;
  sources: SourceRef[];
}

export interface AnnealingPlan {
  guidanceKey: string;
  guidanceTitle: string;
  catalogueVersion: string | null;
  maxSectionThicknessMm: number;
  /** L in the slab formulas: half the thickness, the section being heated from both faces. */
  halfThicknessMm: number;
  diffusivityMm2PerS: number;
  allowedGradientC: number;
  soakToleranceC: number;
  /** null: the surface is taken to follow the oven temperature (Bi → ∞). */
  surfaceBiot: number | null;
  startTemperatureC: number;
  maxTemperatureC: number;
  preSteps: PlanPreStep[];
  segments: PlanSegment[];
  totalDurationH: number;
  rampChecks: RampCheck[];
  soakChecks: SoakCheck[];
  warnings: PlanWarning[];
  notes: string[];
  sources: SourceRef[];
  cautions: string[];
}
