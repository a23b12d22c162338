/**
 * Shape of one annealing guidance entry. Plain JSON data throughout, so a laboratory can add
 * its own entries in the same shape (checked by validateGuidanceEntry) beside the catalogue.
 */

/**
 * How a number came into the data: read in the named document, recalled from memory of it
 * (not re-read), an unwritten workshop practice, or derived from standard results.
 */
export type SourceFlag = 'read' | 'from_memory' | 'common_practice' | 'derived';

export interface SourceRef {
  document: string;
  /** Table, page or section inside the document (or how the value was obtained). */
  locator: string;
  flag: SourceFlag;
}

/** A number with where it came from; `range` keeps the band a source gives when one value is used. */
export interface SourcedNumber {
  value: number;
  range?: [number, number];
  source: SourceRef;
}

export type ReferencePoint =
  | 'glass_transition'
  | 'deflection_temperature'
  | 'annealing_point'
  | 'strain_point'
  | 'softening_point';

export type TemperatureTarget =
  | { kind: 'absolute'; temperatureC: SourcedNumber }
  | { kind: 'relative'; reference: ReferencePoint; referenceTemperatureC: SourcedNumber; offsetC: SourcedNumber }
  /** Back to whatever temperature the oven started from (room temperature). */
  | { kind: 'start_temperature'; source: SourceRef };

export interface ThicknessRateRow {
  minThicknessMm: number;
  maxThicknessMm: number;
  rateCPerH: number;
}

export type RateRule =
  | { kind: 'fixed'; rateCPerH: SourcedNumber }
  /** Rows by thickness; one source covers every number of the table. */
  | { kind: 'thickness_table'; rows: ThicknessRateRow[]; source: SourceRef }
  /** rate = constant / thickness², thickness in mm. */
  | { kind: 'inverse_square'; constantCMm2PerH: SourcedNumber }
  /** The fastest rate whose centre-to-surface lag stays within the entry's allowed gradient. */
  | { kind: 'from_gradient'; capCPerH?: SourcedNumber };

export interface SoakTimeRule {
  hoursPerMm?: SourcedNumber;
  minimumH: SourcedNumber;
  /** Upper end of a practice band; a plan that must exceed it says so. */
  maximumH?: SourcedNumber;
}

export interface HeatingStage {
  rate: RateRule;
  to: TemperatureTarget;
  hold?: SoakTimeRule;
}

export interface MinimumDurationRule {
  hoursPerMm: SourcedNumber;
  appliesAboveThicknessMm: SourcedNumber;
}

export interface CoolingStage {
  rate: RateRule;
  to: TemperatureTarget;
  minimumDuration?: MinimumDurationRule;
}

export interface DryingRow {
  thicknessMm: number;
  durationH: number;
}

export interface DryingPreStep {
  kind: 'drying';
  temperatureC: SourcedNumber;
  rows: DryingRow[];
  source: SourceRef;
}

export type MaterialFamily =
  | 'cast_acrylic'
  | 'polycarbonate'
  | 'epoxy_anhydride'
  | 'soda_lime_glass'
  | 'other';

export interface AnnealingGuidanceEntry {
  /** Stable key, e.g. 'cast-acrylic-sheet.maker-guidance'; never reused for other content. */
  key: string;
  title: string;
  materialFamily: MaterialFamily;
  preSteps?: DryingPreStep[];
  /** Intermediate heating steps before the soak (may be empty). */
  heating: HeatingStage[];
  heatingRateToSoak: RateRule;
  soak: { temperature: TemperatureTarget; time: SoakTimeRule };
  /** The last stage's target is the release temperature. */
  cooling: CoolingStage[];
  thermalDiffusivityMm2PerS: SourcedNumber;
  allowedGradientC: SourcedNumber;
  notes?: string[];
}

export interface AnnealingGuidanceCatalogue {
  version: string;
  entries: AnnealingGuidanceEntry[];
}
