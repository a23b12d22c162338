import type { CreateReadingInput } from '../../../db/inputs/readings.ts';
import { DomainError } from '../../../src/errors/DomainError.ts';
import { colourAtRetardation } from '../../../src/colour/colourAtRetardation.ts';
import { fringeOrderFromColourReading } from '../../../src/optics/fringeOrderFromColourReading.ts';
import { fringeOrderFromReading } from '../../../src/optics/fringeOrderFromReading.ts';

export interface ReadingPreview {
  fringeOrder: { value: number; uncertainty: number };
  retardationNm: { value: number; uncertainty: number };
  wavelengthNm: number;
  formula: string;
  colour: null | {
    ambiguous: boolean;
    ambiguityReason: string | null;
    candidates: { fringeOrder: { value: number; uncertainty: number }; retardationNm: number; deltaE2000: number | null; hex: string; name: string | null }[];
  };
}

/**
 * What the reading will store, computed by the same core functions the save uses; a colour
 * reading also lists every order the colour could be, since colours recur from order to order.
 */
export function previewReading(input: CreateReadingInput): { ok: true; preview: ReadingPreview } | { ok: false; problems: string[] } {
  try {
    const derived = fringeOrderFromReading(input.reading, { wavelengthNm: input.wavelengthNm }, input.uncertaintyFringes);
    let colour: ReadingPreview['colour'] = null;
    if (input.reading.method === 'white_light_colour') {
      const c = fringeOrderFromColourReading(input.reading, derived.wavelengthNm, input.uncertaintyFringes);
      const illuminant = input.reading.illuminant ?? 'D65';
      colour = {
        ambiguous: c.ambiguous,
        ambiguityReason: c.ambiguityReason ?? null,
        candidates: c.candidates.map((k) => ({
          fringeOrder: k.fringeOrder,
          retardationNm: k.retardationNm.value,
          deltaE2000: k.deltaE2000,
          hex: colourAtRetardation(k.retardationNm.value, illuminant).srgbHex,
          name: k.name ?? null,
        })),
      };
    }
    return { ok: true, preview: { fringeOrder: derived.fringeOrder, retardationNm: derived.retardationNm, wavelengthNm: derived.wavelengthNm, formula: derived.formula, colour } };
  } catch (error) {
    if (error instanceof DomainError) return { ok: false, problems: [error.message, ...error.problems.map((p) => `${p.field}: ${p.message}`)] };
    throw error;
  }
}
