import { converter } from 'culori';
import { describe, expect, it } from 'vitest';
import { colourAtRetardation } from '../../../src/colour/colourAtRetardation.ts';
import { sampleIsochromaticSequence } from '../../../src/colour/sampleIsochromaticSequence.ts';
import { DomainError } from '../../../src/errors/DomainError.ts';

const toRgb = converter('rgb');

describe('sampleIsochromaticSequence', () => {
  it('samples δ = 0, step, 2·step … up to the maximum, starting from dark-field black', () => {
    const s = sampleIsochromaticSequence('D65', 2, 1);
    expect(s.retardationNm).toEqual([0, 1, 2]);
    expect(s.displayedLab[0]).toEqual({ l: 0, a: 0, b: 0 });
    expect(s.displayedLab[2]!.l).toBeGreaterThan(s.displayedLab[1]!.l);
  });

  it('counts samples from the step, not from accumulated sums: 0–1 nm in 0.1 nm steps is 11 samples; a step past the maximum gives δ = 0 only', () => {
    const fine = sampleIsochromaticSequence('E', 1, 0.1).retardationNm;
    expect(fine).toHaveLength(11);
    expect(fine[10]).toBe(1);
    expect(sampleIsochromaticSequence('E', 10, 3).retardationNm).toEqual([0, 3, 6, 9]);
    expect(sampleIsochromaticSequence('E', 2, 5).retardationNm).toEqual([0]);
  });

  it('holds the displayed (gamut-clipped) colour: every sample converts to sRGB channels within 0..1 [culori as reference library]', () => {
    const s = sampleIsochromaticSequence('D65', 2000, 10);
    for (const lab of s.displayedLab) {
      const { r, g, b } = toRgb({ mode: 'lab65', ...lab });
      for (const channel of [r, g, b]) {
        expect(channel).toBeGreaterThanOrEqual(-1e-6);
        expect(channel).toBeLessThanOrEqual(1 + 1e-6);
      }
    }
  });

  it('is darkest of the first order near the tint of passage, 545–580 nm [M: Dally & Riley, 577 nm]', () => {
    const s = sampleIsochromaticSequence('D65', 700, 1);
    const l = s.displayedLab.map((lab) => lab.l);
    const firstOrder = l.slice(400);
    expect(400 + firstOrder.indexOf(Math.min(...firstOrder))).toBeGreaterThanOrEqual(545);
    expect(400 + firstOrder.indexOf(Math.min(...firstOrder))).toBeLessThanOrEqual(580);
  });

  it('passes the white adaptation on: first-order white under lamp A looks yellow unadapted, near neutral adapted [M: common practice, an incandescent lamp looks yellow beside daylight]', () => {
    const adapted = sampleIsochromaticSequence('A', 260, 260).displayedLab[1]!;
    const unadapted = sampleIsochromaticSequence('A', 260, 260, { adaptation: 'none' }).displayedLab[1]!;
    expect(unadapted).toEqual(colourAtRetardation(260, 'A', { adaptation: 'none' }).displayedLab);
    expect(unadapted.b).toBeGreaterThan(adapted.b + 10);
    expect(Math.hypot(adapted.a, adapted.b)).toBeLessThan(10);
  });

  it('accepts a 20 000 nm maximum and exactly 20 000 steps, refuses more, and refuses non-positive or non-finite bounds', () => {
    expect(sampleIsochromaticSequence('E', 20_000, 400).retardationNm).toHaveLength(51);
    expect(sampleIsochromaticSequence('E', 100, 100 / 20_000).retardationNm).toHaveLength(20_001);
    const bad: [number, number][] = [[100, 100 / 20_000 * 0.99], [0, 1], [-5, 1], [20_001, 10], [Number.NaN, 1], [100, 0], [100, -1], [100, Number.POSITIVE_INFINITY]];
    for (const [maxNm, stepNm] of bad) expect(() => sampleIsochromaticSequence('E', maxNm, stepNm)).toThrow(DomainError);
  });
});
