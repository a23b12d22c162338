import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { ktOppositeUNotchesFiniteStrip } from '../../../src/concentration/ktOppositeUNotchesFiniteStrip.ts';

// The coefficients are recalled from memory [M: Pilkey, Peterson's Stress Concentration
// Factors, opposite U-notches in tension]; these tests check them against independent limits
// rather than against chart readings we do not have in hand.
const kt = (hOverR: number, twoHOverD: number) => ktOppositeUNotchesFiniteStrip(hOverR, 1, 2 * hOverR / twoHOverD).ktNetSection;

describe('ktOppositeUNotchesFiniteStrip', () => {
  it('evaluates the cubic for a semicircular notch: h = r = 5 mm, D = 40 mm gives 2.113 [M coefficients, C arithmetic]', () => {
    const r = ktOppositeUNotchesFiniteStrip(5, 5, 40);
    // C1..C4 at h/r = 1: 3.043, −4.571, 3.689, −1.159; x = 0.25.
    const hand = 3.043 - 4.571 * 0.25 + 3.689 * 0.0625 - 1.159 * 0.015625;
    expect(r.ktNetSection).toBeCloseTo(hand, 9);
    expect(r.depthToRadiusRatio).toBe(1);
    expect(r.notchedWidthFraction).toBe(0.25);
    expect(r.source).toMatch(/from memory \[M\]/);
    expect(r.warnings).toEqual([]);
  });

  it('tends to the semicircular edge-notch value ≈ 3.07 as 2h/D → 0 [M: common knowledge, 3.065]', () => {
    expect(Math.abs(kt(1, 1e-4) / 3.065 - 1)).toBeLessThan(0.015);
  });

  it('tends to 1 as the notches take up the width, 2h/D → 1, for moderate h/r [C: net-section mean stress limit]', () => {
    for (const hr of [0.5, 1, 4, 10]) expect(Math.abs(kt(hr, 0.999) - 1)).toBeLessThan(0.05);
  });

  it('grows like the Inglis ellipse 1 + 2√(h/r) for shallow sharp notches [M: Inglis; within 5 %]', () => {
    for (const hr of [4, 10, 25, 50]) expect(Math.abs(kt(hr, 1e-4) / (1 + 2 * Math.sqrt(hr)) - 1)).toBeLessThan(0.05);
  });

  it('is continuous within a few per cent where the two branches meet at h/r = 2 [C]', () => {
    for (let x = 0.02; x < 1; x += 0.02) {
      const below = kt(2 - 1e-9, x);
      const at = kt(2, x);
      expect(Math.abs(below / at - 1)).toBeLessThan(0.04);
    }
  });

  it('rises with notch sharpness h/r within a branch (property) [C]', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.1, max: 49, noNaN: true }), fc.double({ min: 0.01, max: 0.95, noNaN: true }), (hr, x) => {
        const hr2 = Math.min(hr * 1.02, hr < 2 ? 1.999 : 50);
        fc.pre(hr2 > hr);
        expect(kt(hr2, x)).toBeGreaterThanOrEqual(kt(hr, x) - 1e-12);
        expect(kt(hr, x)).toBeGreaterThanOrEqual(1);
      }),
    );
  });

  it('never returns below 1, warning where the cubic dips under it', () => {
    const r = ktOppositeUNotchesFiniteStrip(0.1, 1, 0.2 / 0.995);
    expect(r.ktNetSection).toBe(1);
    expect(r.warnings[0]).toMatch(/fit artefact/);
  });

  it('refuses h/r outside 0.1–50 and notches that leave no ligament', () => {
    expect(() => ktOppositeUNotchesFiniteStrip(0.09, 1, 20)).toThrow(/outside the curve fit/);
    expect(() => ktOppositeUNotchesFiniteStrip(51, 1, 200)).toThrow(/outside the curve fit/);
    expect(() => ktOppositeUNotchesFiniteStrip(50, 1, 200).ktNetSection).not.toThrow();
    expect(() => ktOppositeUNotchesFiniteStrip(10, 2, 20)).toThrow(/no net section/);
    expect(() => ktOppositeUNotchesFiniteStrip(5, 0, 40)).toThrow(/rootRadiusMm/);
  });
});
