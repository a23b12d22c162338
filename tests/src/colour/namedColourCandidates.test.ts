import { describe, expect, it } from 'vitest';
import { isochromaticNamedSequence } from '../../../src/colour/isochromaticNamedSequence.ts';
import { namedColourCandidates } from '../../../src/colour/namedColourCandidates.ts';
import { DomainError } from '../../../src/errors/DomainError.ts';

const rectangularU = (width: number) => width / (2 * Math.sqrt(3));

describe('namedColourCandidates', () => {
  // Retardations of the named sequence [M: Dally & Riley isochromatic colour table, from memory].
  it('gives both orders of orange, each band running halfway to its neighbours: 405–490 nm and 870–995 nm [M: Dally & Riley; C]', () => {
    const r = namedColourCandidates('orange', 577, 2.5);
    expect(r.candidates.map((c) => [c.retardationNm.value, c.rangeNm.from, c.rangeNm.to])).toEqual([
      [460, 405, 490], // (350 + 460)/2, (460 + 520)/2
      [940, 870, 995], // (800 + 940)/2, (940 + 1050)/2
    ]);
    expect(r.candidates[0]!.retardationNm.uncertainty).toBeCloseTo(rectangularU(85), 12);
    expect(r.candidates[1]!.retardationNm.uncertainty).toBeCloseTo(rectangularU(125), 12);
    expect(r.candidates[1]!.fringeOrder).toEqual({ value: 940 / 577, uncertainty: rectangularU(125) / 577 });
    expect(r.ambiguous).toBe(true);
    expect(r.ambiguityReason).toBe("the name 'orange' occurs in 2 orders: 460 nm (N ≈ 0.80), 940 nm (N ≈ 1.63)");
  });

  it('starts the black band at zero retardation: 0–80 nm [M: Dally & Riley; C]', () => {
    const [black] = namedColourCandidates('black', 577, 2.5).candidates;
    expect(black!.rangeNm).toEqual({ from: 0, to: 80 });
    expect(black!.retardationNm).toEqual({ value: 0, uncertainty: rectangularU(80) });
  });

  it('mirrors the last name’s lower half-band above it: green 1800 nm runs 1765–1835 nm [M: Dally & Riley; C]', () => {
    const r = namedColourCandidates('green', 577, 2.5);
    expect(r.candidates.map((c) => c.rangeNm)).toEqual([{ from: 1250, to: 1400 }, { from: 1765, to: 1835 }]);
  });

  it('gives one unambiguous candidate for a name used once, with the canonical name, at the chosen reference wavelength', () => {
    const r = namedColourCandidates('Gray', 546.1, 3);
    expect(r.ambiguous).toBe(false);
    expect(r).not.toHaveProperty('ambiguityReason');
    expect(r.candidates).toHaveLength(1);
    expect(r.candidates[0]).toMatchObject({ name: 'grey', basis: 'named-sequence', deltaE2000: null, rangeNm: { from: 80, to: 210 } });
    expect(r.candidates[0]!.fringeOrder.value).toBeCloseTo(160 / 546.1, 12);
    expect(r).toMatchObject({ closeMatch: true, thresholdDeltaE2000: 3, referenceWavelengthNm: 546.1 });
    expect(r.notes.join(' ')).toContain('from memory');
  });

  it('gives bands that tile the table without gaps or overlaps, each holding its own retardation [C]', () => {
    const names = [...new Set(isochromaticNamedSequence.map((e) => e.name))];
    const bands = names
      .flatMap((n) => namedColourCandidates(n, 577, 2.5).candidates)
      .sort((a, b) => a.retardationNm.value - b.retardationNm.value);
    expect(bands).toHaveLength(isochromaticNamedSequence.length);
    bands.forEach((c, i) => {
      expect(c.rangeNm.from).toBeLessThanOrEqual(c.retardationNm.value);
      expect(c.rangeNm.to).toBeGreaterThan(c.retardationNm.value);
      if (i > 0) expect(c.rangeNm.from).toBe(bands[i - 1]!.rangeNm.to);
    });
  });

  it('refuses an unknown or empty name as invalid_input', () => {
    for (const name of ['teal', '', '   ']) {
      try {
        namedColourCandidates(name, 577, 2.5);
        expect.unreachable();
      } catch (e) {
        expect(e).toBeInstanceOf(DomainError);
        expect((e as DomainError).code).toBe('invalid_input');
      }
    }
  });
});
