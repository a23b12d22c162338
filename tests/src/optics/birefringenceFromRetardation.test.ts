import { describe, expect, it } from 'vitest';
import { birefringenceFromRetardation } from '../../../src/optics/birefringenceFromRetardation.ts';
import { monteCarlo } from '../uncertainty/support/monteCarlo.ts';

describe('birefringenceFromRetardation', () => {
  it('gives Δn = δ/t with nm and mm folded [R: ASTM D4093, birefringence = δ/t]', () => {
    // 120 nm through 6 mm: 120e-9 m / 6e-3 m = 2.0e-5 [C].
    const r = birefringenceFromRetardation({ value: 120, uncertainty: 2 }, { value: 6, uncertainty: 0.05 }).birefringence;
    expect(r.value).toBeCloseTo(2.0e-5, 15);
    expect(r.uncertainty).toBeCloseTo(3.7268e-7, 10);
  });
  it('reads a nm-per-cm figure (ISO 10110 classes [M]) as Δn: 10 nm/cm = 1e-6 [C]', () => {
    expect(birefringenceFromRetardation({ value: 10, uncertainty: 0 }, { value: 10, uncertainty: 0 }).birefringence.value).toBeCloseTo(1e-6, 15);
  });
  it('agrees with a repeatable Monte Carlo on the uncertainty [M: GUM-S1]', () => {
    const d = { value: 300, uncertainty: 6 };
    const t = { value: 3, uncertainty: 0.06 };
    const mc = monteCarlo([d, t], (a, b) => (a * 1e-6) / b);
    const u = birefringenceFromRetardation(d, t).birefringence.uncertainty;
    expect(Math.abs(mc.uncertainty / u - 1)).toBeLessThan(0.02);
  });
  it('refuses a non-positive thickness', () => {
    expect(() => birefringenceFromRetardation({ value: 1, uncertainty: 0 }, { value: 0, uncertainty: 0 })).toThrow(/thicknessMm/);
  });
});
