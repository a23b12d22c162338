import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { principalStressDifference } from '../../../src/optics/principalStressDifference.ts';
import { monteCarlo } from '../uncertainty/support/monteCarlo.ts';

const exact = (value: number) => ({ value, uncertainty: 0 });

describe('principalStressDifference', () => {
  it('reproduces a hand-worked tension strip [C]', () => {
    // Strip 10 mm wide, 6 mm thick, 500 N: σ = P/(w·t) = 8.333 MPa. With fσ = 7.0 N/mm per
    // fringe (polycarbonate, about the catalogue value [M: Dally & Riley]) the law predicts
    // N = σ·t/fσ = 7.1429 fringes; feeding that order back must return 8.333 MPa.
    const order = (500 / (10 * 6)) * 6 / 7.0;
    expect(order).toBeCloseTo(7.1429, 4);
    const r = principalStressDifference(exact(order), exact(7.0), exact(6));
    expect(r.stressDifferenceMPa.value).toBeCloseTo(500 / 60, 12);
    expect(r.stressDifferenceMPa.uncertainty).toBe(0);
  });

  it('treats kN/m per fringe and N/mm per fringe as the same unit [C]', () => {
    // 1 kN/m = 1000 N / 1000 mm = 1 N/mm: 3 fringes × 11 kN/m over 6.35 mm = 5.197 MPa.
    expect(principalStressDifference(exact(3), exact(11), exact(6.35)).stressDifferenceMPa.value).toBeCloseTo(5.1969, 4);
  });

  it('propagates u(N), u(fσ), u(t) by first-order GUM, agreeing with a repeatable Monte Carlo [M: GUM, GUM-S1]', () => {
    const n = { value: 2.5, uncertainty: 0.02 };
    const f = { value: 7.0, uncertainty: 0.2 };
    const t = { value: 6.0, uncertainty: 0.05 };
    const r = principalStressDifference(n, f, t).stressDifferenceMPa;
    const hand = Math.sqrt((7 / 6 * 0.02) ** 2 + (2.5 / 6 * 0.2) ** 2 + ((2.5 * 7) / 36 * 0.05) ** 2);
    expect(r.uncertainty).toBeCloseTo(hand, 12);
    expect(r.uncertainty).toBeCloseTo(0.0899, 4);
    const mc = monteCarlo([n, f, t], (a, b, c) => (a * b) / c);
    expect(Math.abs(mc.uncertainty / r.uncertainty - 1)).toBeLessThan(0.02);
    expect(Math.abs(mc.value / r.value - 1)).toBeLessThan(0.002);
  });

  it('keeps u(N) when N = 0 and accepts a signed order', () => {
    expect(principalStressDifference({ value: 0, uncertainty: 0.05 }, exact(10), exact(5)).stressDifferenceMPa).toEqual({ value: 0, uncertainty: 0.1 });
    expect(principalStressDifference(exact(-1), exact(10), exact(5)).stressDifferenceMPa.value).toBe(-2);
  });

  it('refuses a non-positive fringe value or thickness and a negative uncertainty', () => {
    expect(() => principalStressDifference(exact(1), exact(0), exact(5))).toThrow(/fringeValueNPerMm/);
    expect(() => principalStressDifference(exact(1), exact(7), exact(-5))).toThrow(/thicknessMm/);
    expect(() => principalStressDifference({ value: 1, uncertainty: -0.1 }, exact(7), exact(5))).toThrow(/uncertainty/);
  });

  it('scales linearly with N and fσ and inversely with t (property)', () => {
    const pos = fc.double({ min: 0.1, max: 100, noNaN: true });
    fc.assert(
      fc.property(pos, pos, pos, fc.double({ min: 0.1, max: 10, noNaN: true }), (n, f, t, k) => {
        const base = principalStressDifference(exact(n), exact(f), exact(t)).stressDifferenceMPa.value;
        const rel = (x: number) => x / base;
        expect(rel(principalStressDifference(exact(k * n), exact(f), exact(t)).stressDifferenceMPa.value)).toBeCloseTo(k, 9);
        expect(rel(principalStressDifference(exact(n), exact(k * f), exact(t)).stressDifferenceMPa.value)).toBeCloseTo(k, 9);
        expect(rel(principalStressDifference(exact(n), exact(f), exact(k * t)).stressDifferenceMPa.value)).toBeCloseTo(1 / k, 9);
      }),
    );
  });
});
