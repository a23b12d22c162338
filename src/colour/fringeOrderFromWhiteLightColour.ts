import type { Measured } from '../uncertainty/Measured.ts';
import type { CandidateOptions, ColourObservation, FringeOrderCandidate } from './FringeOrderCandidate.ts';
import { fringeOrderCandidatesFromColour } from './fringeOrderCandidatesFromColour.ts';
import type { IlluminantSpec } from './Illuminant.ts';

export interface WhiteLightColourReading {
  colour: ColourObservation;
  /** 'D65' when not given. */
  illuminant?: IlluminantSpec;
  /** 577 nm when not given. */
  referenceWavelengthNm?: number;
  options?: CandidateOptions;
}

export interface WhiteLightColourResult {
  method: 'white-light-colour';
  /** The best candidate's order at the reference wavelength; see `ambiguous` before trusting it. */
  fringeOrder: Measured;
  retardationNm: Measured;
  ambiguous: boolean;
  ambiguityReason?: string;
  closeMatch: boolean;
  candidates: FringeOrderCandidate[];
  referenceWavelengthNm: number;
  notes: string[];
}

const modelNotes = [
  'dark-field circular polariscope, transmission sin²(πδ/λ); dispersion of birefringence neglected',
  'uncertainty covers colour discrimination only (ΔE00 threshold, common practice), not lamp, camera or observer errors',
];

/**
 * Reading method "white-light colour": a fringe order from an isochromatic colour, for storing
 * with a reading. Returns the best candidate as the order, with all candidates and the
 * ambiguity flag, since a colour recurs from order to order.
 *
 * @example
 * const r = fringeOrderFromWhiteLightColour({ colour: { namedColour: 'deep blue' } });
 * r.fringeOrder; // { value: 1.0745, uncertainty: 0.0308 }
 * r.ambiguous;   // false
 */
export function fringeOrderFromWhiteLightColour(reading: WhiteLightColourReading): WhiteLightColourResult {
  const result = fringeOrderCandidatesFromColour(
    reading.colour,
    reading.illuminant ?? 'D65',
    reading.referenceWavelengthNm ?? 577,
    reading.options ?? {},
  );
  const best = result.candidates[0]!;
  return {
    method: 'white-light-colour',
    fringeOrder: best.fringeOrder,
    retardationNm: best.retardationNm,
    ambiguous: result.ambiguous,
    ...(result.ambiguityReason === undefined ? {} : { ambiguityReason: result.ambiguityReason }),
    closeMatch: result.closeMatch,
    candidates: result.candidates,
    referenceWavelengthNm: result.referenceWavelengthNm,
    notes: [...modelNotes, ...result.notes],
  };
}
