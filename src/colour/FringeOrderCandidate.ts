import type { Measured } from '../uncertainty/Measured.ts';
import type { ColourOptions } from './IsochromaticColour.ts';

/** A white-light colour reading: an sRGB colour (photo, swatch), a trade name, or a point on the scale. */
export type ColourObservation = { srgbHex: string } | { namedColour: string } | { retardationNm: number };

export interface FringeOrderCandidate {
  /** Retardation of this candidate, standard uncertainty from the match range. */
  retardationNm: Measured;
  /** retardationNm / referenceWavelengthNm. */
  fringeOrder: Measured;
  /** CIEDE2000 between the reading and the model colour here; null for a named colour. */
  deltaE2000: number | null;
  /** Retardations over which the match holds (ΔE00 within the threshold of the best here). */
  rangeNm: { from: number; to: number };
  basis: 'colour-match' | 'named-sequence';
  /** Table name, for a named colour. */
  name?: string;
}

export interface FringeOrderCandidates {
  /** Colour matches by increasing ΔE00; named colours by increasing retardation. */
  candidates: FringeOrderCandidate[];
  ambiguous: boolean;
  ambiguityReason?: string;
  /** The best match is within the threshold (a named colour always is). */
  closeMatch: boolean;
  thresholdDeltaE2000: number;
  referenceWavelengthNm: number;
  notes: string[];
}

export interface CandidateOptions extends ColourOptions {
  /** ΔE00 taken as just noticeable; 2.5 by default (common practice puts it at about 2–3). */
  thresholdDeltaE2000?: number;
  /** Highest retardation searched; 2000 nm by default (colours wash out beyond about N = 3). */
  searchMaxNm?: number;
  /** At most this many colour-match candidates are returned; 5 by default. */
  maxCandidates?: number;
}
