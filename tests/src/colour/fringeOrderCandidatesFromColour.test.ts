import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { differenceCiede2000 } from 'culori';
import { fringeOrderCandidatesFromColour } from '../../../src/colour/fringeOrderCandidatesFromColour.ts';
import { colourAtRetardation } from '../../../src/colour/colourAtRetardation.ts';
import { DomainError } from '../../../src/errors/DomainError.ts';
import type { ColourObservation } from '../../../src/colour/FringeOrderCandidate.ts';

describe('CIEDE2000 as used here (culori)', () => {
  // Sharma, Wu & Dalal, Color Research and Application 30(1), 2005, Table 1 [M: pairs 1, 2, 7, 17, 25 from memory].
  const pairs: [number[], number[], number][] = [
    [[50, 2.6772, -79.7751], [50, 0, -82.7485], 2.0425],
    [[50, 3.1571, -77.2803], [50, 0, -82.7485], 2.8615],
    [[50, 0, 0], [50, -1, 2], 2.3669],
    [[50, 2.5, 0], [73, 25, -18], 27.1492],
    [[60.2574, -34.0099, 36.2677], [60.4626, -34.1751, 39.4387], 1.2644],
  ];
  it('reproduces the published test pairs to 4 decimals', () => {
    const de = differenceCiede2000();
    const lab = (v: number[]) => ({ mode: 'lab65' as const, l: v[0]!, a: v[1]!, b: v[2]! });
    for (const [a, b, expected] of pairs) expect(de(lab(a), lab(b))).toBeCloseTo(expected, 4);
  });
});

describe('fringeOrderCandidatesFromColour', () => {
  it('reads the tint of passage back as N = 1 with a tight range [M: published 577 nm]', () => {
    const r = fringeOrderCandidatesFromColour({ srgbHex: colourAtRetardation(577, 'D65').srgbHex }, 'D65');
    const best = r.candidates[0]!;
    expect(best.retardationNm.value).toBeGreaterThanOrEqual(575);
    expect(best.retardationNm.value).toBeLessThanOrEqual(579);
    expect(best.fringeOrder.value).toBeCloseTo(1, 2);
    expect(best.deltaE2000).toBeLessThan(1);
    expect(r.closeMatch).toBe(true);
    expect(r.ambiguous).toBe(false);
  });
  it('is more sensitive at the tint of passage than at first-order white (why the tint is used) [M: common practice]', () => {
    const u = (d: number) => fringeOrderCandidatesFromColour({ retardationNm: d }, 'D65').candidates[0]!.retardationNm.uncertainty;
    expect(u(577)).toBeLessThan(u(260) / 2);
  });
  it('sorts colour matches by ΔE00 and flags orders that match within the threshold', () => {
    const r = fringeOrderCandidatesFromColour({ retardationNm: 620 }, 'D65');
    const d = r.candidates.map((c) => c.deltaE2000!);
    expect([...d].sort((a, b) => a - b)).toEqual(d);
    expect(r.ambiguous).toBe(true);
    expect(r.ambiguityReason).toMatch(/^2 orders match within ΔE00 2.5/);
    expect(r.candidates[1]!.retardationNm.value).toBeGreaterThan(1100);
  });
  it('gives one candidate per order of a recurring name, ambiguous, with bands halfway to the neighbours', () => {
    const r = fringeOrderCandidatesFromColour({ namedColour: 'orange' }, 'D65');
    expect(r.ambiguous).toBe(true);
    expect(r.candidates.map((c) => c.rangeNm)).toEqual([{ from: 405, to: 490 }, { from: 870, to: 995 }]);
    expect(r.candidates[0]!.fringeOrder.value).toBeCloseTo(460 / 577, 12);
    expect(r.candidates[0]!.retardationNm.uncertainty).toBeCloseTo(85 / (2 * Math.sqrt(3)), 12);
    expect(r.candidates.every((c) => c.basis === 'named-sequence' && c.deltaE2000 === null)).toBe(true);
  });
  it('uses the reference wavelength for the fringe order', () => {
    const r = fringeOrderCandidatesFromColour({ namedColour: 'deep blue' }, 'D65', 546.1);
    expect(r.candidates[0]!.fringeOrder.value).toBeCloseTo(620 / 546.1, 12);
    expect(r.referenceWavelengthNm).toBe(546.1);
  });
  it('says so when the colour is far from every modelled colour', () => {
    const r = fringeOrderCandidatesFromColour({ srgbHex: '#808080' }, 'D65');
    expect(r.closeMatch).toBe(false);
    expect(r.notes.join(' ')).toContain('exceeds the threshold');
  });
  it('works for a measured lamp spectrum', () => {
    const wavelengthNm = Array.from({ length: 41 }, (_, i) => 380 + 10 * i);
    const lamp = { wavelengthNm, relativePower: wavelengthNm.map((nm) => nm / 5) };
    const r = fringeOrderCandidatesFromColour({ retardationNm: 460 }, lamp);
    expect(r.candidates[0]!.retardationNm.value).toBe(460);
  });
  it('refuses bad hex, unknown names, missing colour and out-of-range retardation', () => {
    const bad: unknown[] = [{ srgbHex: 'purple' }, { srgbHex: '#12345' }, { namedColour: 'teal' }, {}, null, { retardationNm: 5000 }, { retardationNm: -1 }];
    for (const colour of bad) expect(() => fringeOrderCandidatesFromColour(colour as ColourObservation, 'D65')).toThrow(DomainError);
    expect(() => fringeOrderCandidatesFromColour({ srgbHex: '#000' }, 'D65', 300)).toThrow(DomainError);
  });
  it('finds a scale colour’s own retardation among the candidates, within its range (property)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 1800 }), fc.constantFrom('D65' as const, 'A' as const), (d, illuminant) => {
        const hex = colourAtRetardation(d, illuminant).srgbHex;
        const r = fringeOrderCandidatesFromColour({ srgbHex: hex }, illuminant);
        // 8-bit hex rounding moves the colour by well under ΔE00 1, so allow the 1 nm grid either side.
        expect(r.candidates.some((c) => d >= c.rangeNm.from - 1 && d <= c.rangeNm.to + 1)).toBe(true);
      }),
      { numRuns: 25 },
    );
  });
});
