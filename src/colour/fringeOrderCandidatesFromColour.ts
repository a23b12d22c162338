import { converter, parse } from 'culori';
import { DomainError } from '../errors/DomainError.ts';
import { requireNumber } from '../guards/requireNumber.ts';
import { colourAtRetardation } from './colourAtRetardation.ts';
import { colourMatchCandidates } from './colourMatchCandidates.ts';
import type { CandidateOptions, ColourObservation, FringeOrderCandidates } from './FringeOrderCandidate.ts';
import type { IlluminantSpec } from './Illuminant.ts';
import type { LabD65 } from './IsochromaticColour.ts';
import { namedColourCandidates } from './namedColourCandidates.ts';

const toLab65 = converter('lab65');
const hexPattern = /^#?([0-9a-f]{3}|[0-9a-f]{6})$/i;

function labOfHex(srgbHex: string): LabD65 {
  const parsed = typeof srgbHex === 'string' && hexPattern.test(srgbHex.trim()) ? parse(srgbHex.trim().replace(/^#?/, '#')) : undefined;
  if (!parsed) {
    throw new DomainError('invalid_input', `srgbHex '${String(srgbHex)}' is not an sRGB hex colour`, [
      { field: 'colour.srgbHex', message: "must look like '#a1b2c3' or '#abc'" },
    ]);
  }
  const { l, a, b } = toLab65(parsed);
  return { l, a, b };
}

/**
 * Candidate fringe orders for a white-light colour seen in a dark-field circular polariscope.
 * An sRGB colour, or the colour of a point on the scale, is matched along the modelled sequence
 * by CIEDE2000 (see `colourMatchCandidates`); a trade name is looked up in the named sequence
 * (see `namedColourCandidates`). Fringe orders are δ / referenceWavelengthNm.
 *
 * @example
 * const r = fringeOrderCandidatesFromColour({ namedColour: 'orange' }, 'D65');
 * r.ambiguous;                                             // true
 * r.candidates.map((c) => c.fringeOrder.value.toFixed(2)); // ['0.80', '1.63']
 *
 * fringeOrderCandidatesFromColour({ srgbHex: '#2f2ed1' }, 'D65').candidates[0].retardationNm;
 * // { value: 577, uncertainty: 2.31 }
 */
export function fringeOrderCandidatesFromColour(
  colour: ColourObservation,
  illuminant: IlluminantSpec = 'D65',
  referenceWavelengthNm = 577,
  options: CandidateOptions = {},
): FringeOrderCandidates {
  const lambdaRef = requireNumber('referenceWavelengthNm', referenceWavelengthNm, { min: 380, max: 780 });
  const threshold = requireNumber('thresholdDeltaE2000', options.thresholdDeltaE2000 ?? 2.5, { above: 0, max: 50 });
  const searchMaxNm = requireNumber('searchMaxNm', options.searchMaxNm ?? 2000, { min: 100, max: 10_000 });
  const maxCandidates = requireNumber('maxCandidates', options.maxCandidates ?? 5, { min: 1, max: 50 });
  if (typeof colour !== 'object' || colour === null) {
    throw new DomainError('invalid_input', 'colour is missing', [
      { field: 'colour', message: 'must be { srgbHex } or { namedColour } or { retardationNm }' },
    ]);
  }
  if ('namedColour' in colour) return namedColourCandidates(colour.namedColour, lambdaRef, threshold);
  let target: LabD65;
  if ('srgbHex' in colour) {
    target = labOfHex(colour.srgbHex);
  } else if ('retardationNm' in colour) {
    const delta = requireNumber('colour.retardationNm', colour.retardationNm, { min: 0, max: searchMaxNm });
    target = colourAtRetardation(delta, illuminant, options).displayedLab;
  } else {
    throw new DomainError('invalid_input', 'colour has none of srgbHex, namedColour, retardationNm', [
      { field: 'colour', message: 'must be { srgbHex } or { namedColour } or { retardationNm }' },
    ]);
  }
  return colourMatchCandidates(target, illuminant, {
    ...options,
    referenceWavelengthNm: lambdaRef,
    thresholdDeltaE2000: threshold,
    searchMaxNm,
    maxCandidates: Math.floor(maxCandidates),
  });
}
