import { converter, differenceCiede2000 } from 'culori';
import { describe, expect, it } from 'vitest';
import { colourAtRetardation } from '../../../src/colour/colourAtRetardation.ts';
import { colourMatchCandidates } from '../../../src/colour/colourMatchCandidates.ts';
import type { ColourMatchSettings } from '../../../src/colour/colourMatchCandidates.ts';
import type { LabD65 } from '../../../src/colour/IsochromaticColour.ts';

const settings: ColourMatchSettings = { referenceWavelengthNm: 577, thresholdDeltaE2000: 2.5, searchMaxNm: 2000, maxCandidates: 5 };
const rectangularU = (width: number) => width / (2 * Math.sqrt(3));
const de = differenceCiede2000();
const deTo = (target: LabD65, nm: number) => de({ mode: 'lab65', ...target }, { mode: 'lab65', ...colourAtRetardation(nm, 'D65').displayedLab });

describe('colourMatchCandidates', () => {
  it('reads the first-order tint of passage as 577 nm, N = 1, range 573–581 nm, u = 8/(2√3) nm [M: Dally & Riley, 577 nm; C]', () => {
    const r = colourMatchCandidates({ l: 32.1, a: 54.4, b: -81.7 }, 'D65', settings);
    const best = r.candidates[0]!;
    expect(best.retardationNm.value).toBe(577);
    expect(best.rangeNm).toEqual({ from: 573, to: 581 });
    expect(best.retardationNm.uncertainty).toBeCloseTo(rectangularU(8), 12);
    expect(best.fringeOrder).toEqual({ value: 1, uncertainty: rectangularU(8) / 577 });
    expect(best.basis).toBe('colour-match');
    expect(r).toMatchObject({ ambiguous: false, closeMatch: true, thresholdDeltaE2000: 2.5, referenceWavelengthNm: 577, notes: [] });
  });

  it('reports ΔE00 as culori’s CIEDE2000 to the modelled colour at each candidate, best first, ranges disjoint [culori as reference library]', () => {
    const target = colourAtRetardation(700, 'D65').displayedLab;
    const r = colourMatchCandidates(target, 'D65', settings);
    expect(r.candidates).toHaveLength(5);
    const d = r.candidates.map((c) => c.deltaE2000!);
    expect([...d].sort((a, b) => a - b)).toEqual(d);
    for (const c of r.candidates) {
      expect(c.deltaE2000).toBeCloseTo(deTo(target, c.retardationNm.value), 9);
      expect(c.retardationNm.value).toBeGreaterThanOrEqual(c.rangeNm.from);
      expect(c.retardationNm.value).toBeLessThanOrEqual(c.rangeNm.to);
      // Every retardation of the range matches within the threshold of this candidate's minimum.
      for (let nm = c.rangeNm.from; nm <= c.rangeNm.to; nm += 1) expect(deTo(target, nm)).toBeLessThanOrEqual(c.deltaE2000! + 2.5 + 1e-9);
    }
    const byStart = [...r.candidates].sort((a, b) => a.rangeNm.from - b.rangeNm.from);
    byStart.slice(1).forEach((c, i) => expect(c.rangeNm.from).toBeGreaterThan(byStart[i]!.rangeNm.to));
  });

  it('flags the second-order tint of passage as a rival of deep blue (620 nm) [M: Dally & Riley, 620 and 1150 nm]', () => {
    const r = colourMatchCandidates(colourAtRetardation(620, 'D65').displayedLab, 'D65', settings);
    expect(r.ambiguous).toBe(true);
    expect(r.candidates[0]!.retardationNm.value).toBe(620);
    expect(Math.abs(r.candidates[1]!.retardationNm.value - 1150)).toBeLessThanOrEqual(10);
    expect(r.ambiguityReason).toMatch(/^2 orders match within ΔE00 2.5 of the best: N ≈ 1\.07 \(ΔE00 0\.0\), N ≈ 2\.0\d \(ΔE00 2\.\d\)$/);
  });

  it('starts a range at the first sample for dark-field black, and gives a 1 nm range its floor width [C]', () => {
    const black = colourMatchCandidates({ l: 0, a: 0, b: 0 }, 'D65', settings).candidates[0]!;
    expect(black.retardationNm.value).toBe(0);
    expect(black.rangeNm.from).toBe(0);
    expect(black.retardationNm.uncertainty).toBeCloseTo(rectangularU(black.rangeNm.to), 12);
    const exact = colourMatchCandidates(colourAtRetardation(577, 'D65').displayedLab, 'D65', { ...settings, thresholdDeltaE2000: 1e-3 }).candidates[0]!;
    expect(exact.rangeNm).toEqual({ from: 577, to: 577 });
    expect(exact.retardationNm.uncertainty).toBeCloseTo(rectangularU(1), 12);
  });

  it('returns at most maxCandidates and divides by the chosen reference wavelength', () => {
    const r = colourMatchCandidates(colourAtRetardation(460, 'D65').displayedLab, 'D65', { ...settings, maxCandidates: 2, referenceWavelengthNm: 546.1 });
    expect(r.candidates).toHaveLength(2);
    expect(r.candidates[0]!.fringeOrder.value).toBeCloseTo(460 / 546.1, 12);
  });

  it('says when no modelled colour is close: mid grey #808080 [culori: sRGB → CIELAB D65]', () => {
    const { l, a, b } = converter('lab65')('#808080')!;
    const r = colourMatchCandidates({ l, a, b }, 'D65', settings);
    expect(r.closeMatch).toBe(false);
    expect(r.candidates[0]!.deltaE2000).toBeGreaterThan(2.5);
    expect(r.notes.some((n) => n.startsWith(`best match ΔE00 ${r.candidates[0]!.deltaE2000!.toFixed(1)} exceeds the threshold 2.5`))).toBe(true);
  });

  it('warns that higher orders were not searched only when a match reaches the end of the search', () => {
    const atEnd = colourMatchCandidates(colourAtRetardation(600, 'D65').displayedLab, 'D65', { ...settings, searchMaxNm: 600 });
    expect(atEnd.candidates[0]!.rangeNm.to).toBe(600);
    expect(atEnd.notes).toContain('a match range reaches the end of the search at 600 nm; higher orders were not searched');
    // A far-off candidate (ΔE00 ≫ threshold) whose range ends at 2000 nm is not a match, so it does not warn.
    const tint = colourMatchCandidates(colourAtRetardation(577, 'D65').displayedLab, 'D65', settings);
    expect(tint.candidates.some((c) => c.rangeNm.to === 2000 && c.deltaE2000! > 2.5 + tint.candidates[0]!.deltaE2000!)).toBe(true);
    expect(tint.notes).toEqual([]);
  });
});
