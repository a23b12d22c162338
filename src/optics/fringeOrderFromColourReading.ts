import type { ColourObservation, FringeOrderCandidate } from '../colour/FringeOrderCandidate.ts';
import { fringeOrderFromWhiteLightColour } from '../colour/fringeOrderFromWhiteLightColour.ts';
import { DomainError } from '../errors/DomainError.ts';
import type { Measured } from '../uncertainty/Measured.ts';
import type { MethodFringeOrder, WhiteLightColourInput } from './ReadingMethodInput.ts';
import { resolveReadingUncertainty } from './resolveReadingUncertainty.ts';

export interface ColourReadingFringeOrder extends MethodFringeOrder {
  retardationNm: Measured;
  ambiguous: boolean;
  ambiguityReason?: string;
  closeMatch: boolean;
  candidates: FringeOrderCandidate[];
}

const COLOUR_FIELDS = ['srgbHex', 'namedColour', 'retardationNm'] as const;

function observationOf(reading: WhiteLightColourInput): ColourObservation {
  const given = COLOUR_FIELDS.filter((f) => reading[f] !== undefined);
  if (given.length !== 1) {
    throw new DomainError('invalid_input', `a white-light colour reading gives exactly one of ${COLOUR_FIELDS.join(', ')}`, [
      { field: 'reading', message: given.length === 0 ? 'no colour given' : `several given: ${given.join(', ')}` },
    ]);
  }
  if (reading.srgbHex !== undefined) return { srgbHex: reading.srgbHex };
  if (reading.namedColour !== undefined) return { namedColour: reading.namedColour };
  return { retardationNm: reading.retardationNm! };
}

function describeColour(o: ColourObservation): string {
  if ('srgbHex' in o) return `sRGB ${o.srgbHex}`;
  if ('namedColour' in o) return `named colour '${o.namedColour}'`;
  return `scale colour at ${o.retardationNm} nm`;
}

/**
 * Reading method "white-light colour" as the reading dispatcher needs it: the best candidate
 * of `fringeOrderFromWhiteLightColour` as the order at `wavelengthNm`, with the other
 * candidates and the ambiguity kept beside it. An explicit `uncertaintyFringes` replaces the
 * colour-discrimination uncertainty, and the retardation's follows as u·λ.
 *
 * @example
 * const r = fringeOrderFromColourReading({ method: 'white_light_colour', retardationNm: 577 }, 577);
 * r.fringeOrder;  // { value: 1, uncertainty: 0.0040 }
 * r.ambiguous;    // false
 * r.formula;      // 'white-light colour: scale colour at 577 nm matched at δ = 577 nm (ΔE00 0.00); N = δ/λ = 577/577 = 1'
 */
export function fringeOrderFromColourReading(reading: WhiteLightColourInput, wavelengthNm: number, uncertaintyFringes?: number): ColourReadingFringeOrder {
  const colour = observationOf(reading);
  const result = fringeOrderFromWhiteLightColour({ colour, illuminant: reading.illuminant ?? 'D65', referenceWavelengthNm: wavelengthNm });
  const u = resolveReadingUncertainty(uncertaintyFringes, result.fringeOrder.uncertainty);
  const best = result.candidates[0]!;
  const delta = best.retardationNm.value;
  const match = best.deltaE2000 === null ? `table entry '${best.name ?? ''}'` : `ΔE00 ${best.deltaE2000.toFixed(2)}`;
  const value = result.fringeOrder.value;
  return {
    fringeOrder: { value, uncertainty: u },
    retardationNm: { value: delta, uncertainty: u * wavelengthNm },
    formula: `white-light colour: ${describeColour(colour)} matched at δ = ${delta} nm (${match}); N = δ/λ = ${delta}/${wavelengthNm} = ${Number(value.toFixed(4))}`,
    ambiguous: result.ambiguous,
    ...(result.ambiguityReason === undefined ? {} : { ambiguityReason: result.ambiguityReason }),
    closeMatch: result.closeMatch,
    candidates: result.candidates,
  };
}
