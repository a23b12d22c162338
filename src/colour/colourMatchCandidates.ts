import { differenceCiede2000 } from 'culori';
import type { FringeOrderCandidate, FringeOrderCandidates } from './FringeOrderCandidate.ts';
import type { IlluminantSpec } from './Illuminant.ts';
import type { ColourOptions, LabD65 } from './IsochromaticColour.ts';
import { sampleIsochromaticSequence } from './sampleIsochromaticSequence.ts';

export interface ColourMatchSettings extends ColourOptions {
  referenceWavelengthNm: number;
  thresholdDeltaE2000: number;
  searchMaxNm: number;
  maxCandidates: number;
}

const searchStepNm = 1;
const deltaE2000 = differenceCiede2000();

interface Basin {
  index: number;
  from: number;
  to: number;
}

/**
 * Retardations whose displayed isochromatic colour matches a CIELAB (D65) colour: every local
 * minimum of ΔE00 (culori's CIEDE2000) along the sequence sampled at 1 nm, best first, each with
 * the range over which ΔE00 stays within the threshold of that minimum. A minimum inside a better
 * candidate's range is the same candidate; a worse candidate's range stops where a better one's
 * begins. Standard uncertainty of the retardation: the range taken
 * as a rectangular distribution, u = width / (2√3). Ambiguous when two or more candidates lie
 * within the threshold of the best.
 *
 * @example
 * colourMatchCandidates({ l: 32.1, a: 54.4, b: -81.7 }, 'D65',
 *   { referenceWavelengthNm: 577, thresholdDeltaE2000: 2.5, searchMaxNm: 2000, maxCandidates: 5 })
 *   .candidates[0].retardationNm; // { value: 577, uncertainty: 2.31 } (tint of passage; range 573–581 nm)
 */
export function colourMatchCandidates(
  target: LabD65,
  illuminant: IlluminantSpec,
  settings: ColourMatchSettings,
): FringeOrderCandidates {
  const { referenceWavelengthNm, thresholdDeltaE2000: threshold, searchMaxNm, maxCandidates } = settings;
  const sequence = sampleIsochromaticSequence(illuminant, searchMaxNm, searchStepNm, settings);
  const targetLab = { mode: 'lab65' as const, ...target };
  const d = sequence.displayedLab.map((lab) => deltaE2000(targetLab, { mode: 'lab65', ...lab }));
  const last = d.length - 1;
  const minima = d
    .map((_, i) => i)
    .filter((i) => (i === 0 || d[i]! < d[i - 1]!) && (i === last || d[i]! <= d[i + 1]!))
    .sort((a, b) => d[a]! - d[b]!);
  const basins: Basin[] = [];
  const claimed = (i: number) => basins.some((b) => i >= b.from && i <= b.to);
  for (const index of minima) {
    if (claimed(index)) continue;
    const limit = d[index]! + threshold;
    let from = index;
    let to = index;
    while (from > 0 && d[from - 1]! <= limit && !claimed(from - 1)) from -= 1;
    while (to < last && d[to + 1]! <= limit && !claimed(to + 1)) to += 1;
    basins.push({ index, from, to });
  }
  const nm = (i: number) => sequence.retardationNm[i]!;
  const candidates: FringeOrderCandidate[] = basins.slice(0, maxCandidates).map((b) => {
    const uncertainty = Math.max(nm(b.to) - nm(b.from), searchStepNm) / (2 * Math.sqrt(3));
    return {
      retardationNm: { value: nm(b.index), uncertainty },
      fringeOrder: { value: nm(b.index) / referenceWavelengthNm, uncertainty: uncertainty / referenceWavelengthNm },
      deltaE2000: d[b.index]!,
      rangeNm: { from: nm(b.from), to: nm(b.to) },
      basis: 'colour-match',
    };
  });
  const best = candidates[0]!;
  const rivals = candidates.filter((c) => c.deltaE2000! <= best.deltaE2000! + threshold);
  const notes: string[] = [];
  // Only a match (within the threshold of the best) makes the unsearched orders matter.
  if (rivals.some((c) => c.rangeNm.to === nm(last))) notes.push(`a match range reaches the end of the search at ${searchMaxNm} nm; higher orders were not searched`);
  if (best.deltaE2000! > threshold) {
    notes.push(`best match ΔE00 ${best.deltaE2000!.toFixed(1)} exceeds the threshold ${threshold}: the colour is not on the modelled sequence (lamp, camera or exposure may differ)`);
  }
  const orders = rivals.map((c) => `N ≈ ${c.fringeOrder.value.toFixed(2)} (ΔE00 ${c.deltaE2000!.toFixed(1)})`).join(', ');
  return {
    candidates,
    ambiguous: rivals.length > 1,
    ...(rivals.length > 1 ? { ambiguityReason: `${rivals.length} orders match within ΔE00 ${threshold} of the best: ${orders}` } : {}),
    closeMatch: best.deltaE2000! <= threshold,
    thresholdDeltaE2000: threshold,
    referenceWavelengthNm,
    notes,
  };
}
