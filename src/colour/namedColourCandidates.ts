import type { FringeOrderCandidate, FringeOrderCandidates } from './FringeOrderCandidate.ts';
import { isochromaticNamedSequence } from './isochromaticNamedSequence.ts';
import { namedIsochromaticEntries } from './namedIsochromaticEntries.ts';

/**
 * Candidates for a colour read by name: every order of the named sequence carrying the name.
 * A name stands for a band of colours, so each candidate's range runs halfway to the
 * neighbouring names of the table; its standard uncertainty is that band taken as rectangular,
 * u = width / (2√3). Ambiguous when the name occurs in more than one order.
 *
 * @example
 * namedColourCandidates('orange', 577, 2.5).candidates.map((c) => c.rangeNm);
 * // [{ from: 405, to: 490 }, { from: 870, to: 995 }]
 */
export function namedColourCandidates(
  name: string,
  referenceWavelengthNm: number,
  thresholdDeltaE2000: number,
): FringeOrderCandidates {
  const entries = namedIsochromaticEntries(name);
  const table = isochromaticNamedSequence;
  const candidates: FringeOrderCandidate[] = entries.map((entry) => {
    const i = table.indexOf(entry);
    const here = entry.retardationNm;
    const previous = table[i - 1]?.retardationNm;
    const next = table[i + 1]?.retardationNm;
    const from = previous === undefined ? here : (previous + here) / 2;
    const to = next === undefined ? here + (here - previous!) / 2 : (here + next) / 2;
    const uncertainty = (to - from) / (2 * Math.sqrt(3));
    return {
      retardationNm: { value: here, uncertainty },
      fringeOrder: { value: here / referenceWavelengthNm, uncertainty: uncertainty / referenceWavelengthNm },
      deltaE2000: null,
      rangeNm: { from, to },
      basis: 'named-sequence',
      name: entry.name,
    };
  });
  const ambiguous = candidates.length > 1;
  const listed = candidates.map((c) => `${c.retardationNm.value} nm (N ≈ ${c.fringeOrder.value.toFixed(2)})`).join(', ');
  return {
    candidates,
    ambiguous,
    ...(ambiguous ? { ambiguityReason: `the name '${entries[0]!.name}' occurs in ${candidates.length} orders: ${listed}` } : {}),
    closeMatch: true,
    thresholdDeltaE2000,
    referenceWavelengthNm,
    notes: ['named colours follow the table of Dally & Riley (from memory); a name covers a band of retardations'],
  };
}
