/** One oven log sample: elapsed hours since the cycle started, or a timestamp (ISO text or epoch ms). */
export interface OvenLogSample {
  elapsedH?: number;
  timestamp?: string | number;
  temperatureC: number;
}

export interface OvenLogTolerances {
  /** Largest |measured − planned| before it is remarked on, °C. */
  deviationC: number;
  /** Window over which the rolling ramp rate is fitted (least-squares slope), h, so sample noise does not read as rate. */
  rateWindowH: number;
  /** Slack on a planned rate: allowed = planned·(1 + fraction) + absolute. */
  rateToleranceCPerH: number;
  rateToleranceFraction: number;
  /** A soak counts as held while the oven stays within this band of the soak temperature, °C. */
  soakBandC: number;
  /** How much shorter than planned a held soak may be, h. */
  soakShortfallH: number;
  /** How far the oven may go above the plan's highest temperature, °C. */
  overshootC: number;
  /** Longest interval between samples that is not a gap, h. */
  maxGapH: number;
}

export type OvenLogFindingKind = 'deviation' | 'rate_exceeded' | 'soak_short' | 'overshoot' | 'gap' | 'log_ends_early';

export interface OvenLogFinding {
  kind: OvenLogFindingKind;
  /** 'fault' fails the run; 'remark' is worth a look but does not. */
  severity: 'fault' | 'remark';
  atH: number;
  untilH: number | null;
  message: string;
  numbers: Record<string, number>;
}

export interface SoakHold {
  segmentNumber: number;
  temperatureC: number;
  plannedH: number;
  /** Longest continuous time within the soak band that overlaps the planned soak. */
  heldH: number;
  fromH: number | null;
  toH: number | null;
}

export interface OvenLogComparison {
  sampleCount: number;
  elapsedH: number[];
  /** Planned temperature at each sample; null after the plan has ended. */
  expectedC: (number | null)[];
  maxAbsDeviationC: number;
  maxDeviationAtH: number | null;
  rmsDeviationC: number;
  soakHolds: SoakHold[];
  findings: OvenLogFinding[];
  verdict: 'pass' | 'pass_with_remarks' | 'fail';
  reasons: string[];
  tolerances: OvenLogTolerances;
}
