import type { Measured } from '../uncertainty/Measured.ts';

/** The moments at which a site's fringe order is read. */
export type StageName = 'fabrication' | 'underLoad' | 'afterUnload' | 'beforeAnneal' | 'afterAnneal';

/**
 * One fringe-order reading at a site. When `signKnown`, `order.value` is signed along the
 * boundary tangent (tension positive); otherwise it is a magnitude ≥ 0.
 */
export interface StageReading {
  order: Measured;
  signKnown: boolean;
}

export interface LoadedStageReading extends StageReading {
  loadN: number;
}

export interface SiteStagesInput {
  fabrication?: StageReading;
  underLoad?: LoadedStageReading;
  afterUnload?: StageReading;
  beforeAnneal?: StageReading;
  afterAnneal?: StageReading;
  fringeValueNPerMm: Measured;
  thicknessMm: Measured;
  /** At a free boundary σ2 = 0, so the order gives the edge stress itself. */
  onFreeEdge: boolean;
}

export type StressKind = 'edge_stress' | 'principal_stress_difference';

export interface StressFromOrder {
  stressMPa: Measured;
  kind: StressKind;
}

/** A signed fringe order (or difference of orders) with the stress it stands for. */
export interface OrderQuantity {
  order: Measured;
  stress: StressFromOrder;
  /** Stages whose sign was not measured and was taken as positive. */
  stagesWithAssumedSign: StageName[];
  signNote?: string;
}

export type LoadCorrectedValidity = 'valid_at_free_boundary' | 'valid_only_if_principal_directions_agree';

export interface LoadCorrectedOrder extends OrderQuantity {
  loadN: number;
  validity: LoadCorrectedValidity;
  validityNote: string;
}

export type RatioOrUndefined =
  | { defined: true; ratio: Measured }
  | { defined: false; reason: string };

export type PermanentSetShare =
  | {
      defined: true;
      share: Measured;
      coverageFactor: number;
      /** Set when a reading lacks a sign and the magnitude fell after loading. */
      possibleRelaxationOrSignReversal: boolean;
      notes: string[];
    }
  | {
      defined: false;
      reason: string;
      coverageFactor: number;
      possibleRelaxationOrSignReversal: boolean;
    };

export type RatioQuantity = RatioOrUndefined & {
  stagesWithAssumedSign: StageName[];
  signNote?: string;
};

export interface SiteStagesAnalysis {
  coverageFactor: number;
  stressKind: StressKind;
  /** Each reading given, signed as used, with its stress. */
  stages: Partial<Record<StageName, OrderQuantity>>;
  fabricationResidual?: OrderQuantity;
  loadCorrected?: LoadCorrectedOrder;
  permanentSet?: OrderQuantity;
  permanentSetShare?: PermanentSetShare & { stagesWithAssumedSign: StageName[]; signNote?: string };
  inelasticFractionOfPeak?: RatioQuantity;
  annealRelief?: RatioQuantity;
  notes: string[];
}
