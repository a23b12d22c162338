import { describe, expect, it } from 'vitest';
import { strainFringeValue } from '../../../src/optics/strainFringeValue.ts';
import { monteCarlo } from '../uncertainty/support/monteCarlo.ts';

describe('strainFringeValue', () => {
  it('gives fε = fσ(1 + ν)/E in mm per fringe [C: plane Hooke law]', () => {
    // Polycarbonate-like: fσ 7.0 N/mm, E 2400 MPa, ν 0.37 [values R/M per REFERENCES] → 4.0 µm per fringe.
    const r = strainFringeValue({ value: 7.0, uncertainty: 0.2 }, { value: 2400, uncertainty: 100 }, { value: 0.37, uncertainty: 0.01 }).strainFringeValueMmPerFringe;
    expect(r.value).toBeCloseTo(0.0039958, 7);
    expect(r.uncertainty).toBeCloseTo(0.000204, 6);
  });
  it('is consistent with the stress-optic law: E(ε1−ε2)/(1+ν) = σ1−σ2 for the same N [C]', () => {
    const f = 11, e = 3300, nu = 0.36, n = 2.4, t = 6;
    const fe = strainFringeValue({ value: f, uncertainty: 0 }, { value: e, uncertainty: 0 }, { value: nu, uncertainty: 0 }).strainFringeValueMmPerFringe.value;
    expect((e * (n * fe / t)) / (1 + nu)).toBeCloseTo((n * f) / t, 12);
  });
  it('agrees with a repeatable Monte Carlo on the uncertainty [M: GUM-S1]', () => {
    const f = { value: 7.0, uncertainty: 0.2 }, e = { value: 2400, uncertainty: 100 }, nu = { value: 0.37, uncertainty: 0.01 };
    const mc = monteCarlo([f, e, nu], (a, b, c) => (a * (1 + c)) / b);
    const u = strainFringeValue(f, e, nu).strainFringeValueMmPerFringe.uncertainty;
    expect(Math.abs(mc.uncertainty / u - 1)).toBeLessThan(0.03);
  });
  it('refuses ν outside (−1, 0.5] and a non-positive modulus', () => {
    const f = { value: 7, uncertainty: 0 };
    expect(() => strainFringeValue(f, { value: 2400, uncertainty: 0 }, { value: 0.6, uncertainty: 0 })).toThrow(/poissonRatio/);
    expect(() => strainFringeValue(f, { value: 0, uncertainty: 0 }, { value: 0.3, uncertainty: 0 })).toThrow(/youngsModulusMPa/);
  });
});
