import { describe, expect, it } from 'vitest';
import { measuredStressConcentration } from '../../../src/concentration/measuredStressConcentration.ts';
import { monteCarlo } from '../uncertainty/support/monteCarlo.ts';

describe('measuredStressConcentration', () => {
  const root = { value: 9.6, uncertainty: 0.15 }, load = { value: 800, uncertainty: 4 };
  const width = { value: 30, uncertainty: 0.02 }, thick = { value: 6, uncertainty: 0.02 };

  it('gives Kt = σ_root/(P/(w·t)) [C: definition of net-section Kt]', () => {
    const r = measuredStressConcentration(root, load, width, thick);
    if (!r.defined) throw new Error('expected defined');
    expect(r.nominalStressMPa.value).toBeCloseTo(800 / 180, 12);
    expect(r.kt.value).toBeCloseTo(2.16, 12);
    expect(r.kt.uncertainty).toBeCloseTo(2.16 * Math.hypot(0.15 / 9.6, 4 / 800, 0.02 / 30, 0.02 / 6), 12);
  });

  it('agrees with a repeatable Monte Carlo on u(Kt) [M: GUM-S1]', () => {
    const r = measuredStressConcentration(root, load, width, thick);
    if (!r.defined) throw new Error('expected defined');
    const mc = monteCarlo([root, load, width, thick], (s, p, w, t) => (s * w * t) / p);
    expect(Math.abs(mc.uncertainty / r.kt.uncertainty - 1)).toBeLessThan(0.02);
  });

  it('is undefined when the load cannot be told from zero', () => {
    const r = measuredStressConcentration(root, { value: 5, uncertainty: 4 }, width, thick);
    expect(r.defined).toBe(false);
  });

  it('refuses a non-positive net width or thickness', () => {
    expect(() => measuredStressConcentration(root, load, { value: 0, uncertainty: 0 }, thick)).toThrow(/netWidthMm/);
    expect(() => measuredStressConcentration(root, load, width, { value: -6, uncertainty: 0 })).toThrow(/thicknessMm/);
  });
});
