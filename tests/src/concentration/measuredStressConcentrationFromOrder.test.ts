import { describe, expect, it } from 'vitest';
import { measuredStressConcentrationFromOrder } from '../../../src/concentration/measuredStressConcentrationFromOrder.ts';
import { measuredStressConcentration } from '../../../src/concentration/measuredStressConcentration.ts';
import { edgeStressFromFringeOrder } from '../../../src/optics/edgeStressFromFringeOrder.ts';
import { monteCarlo } from '../uncertainty/support/monteCarlo.ts';

const n = { value: 5.4, uncertainty: 0.02 }, f = { value: 10.8, uncertainty: 0.15 };
const p = { value: 800, uncertainty: 4 }, w = { value: 30, uncertainty: 0.02 };

describe('measuredStressConcentrationFromOrder', () => {
  it('equals σ_root/σ_nom through the stress-optic law for any thickness [C]', () => {
    const r = measuredStressConcentrationFromOrder(n, f, p, w);
    if (!r.defined) throw new Error('expected defined');
    expect(r.kt.value).toBeCloseTo(2.187, 12);
    for (const t of [3, 6, 9.5]) {
      const exact = (value: number) => ({ value, uncertainty: 0 });
      const sigma = edgeStressFromFringeOrder(exact(5.4), exact(10.8), exact(t)).stressMPa;
      const viaStress = measuredStressConcentration(sigma, exact(800), exact(30), exact(t));
      expect(viaStress.defined && viaStress.kt.value).toBeCloseTo(r.kt.value, 12);
    }
  });

  it('carries no u(t) and agrees with a Monte Carlo on N·fσ·w/P [M: GUM-S1]', () => {
    const r = measuredStressConcentrationFromOrder(n, f, p, w);
    if (!r.defined) throw new Error('expected defined');
    const mc = monteCarlo([n, f, p, w], (a, b, c, d) => (a * b * d) / c);
    expect(Math.abs(mc.uncertainty / r.kt.uncertainty - 1)).toBeLessThan(0.02);
  });

  it('is undefined at zero load', () => {
    expect(measuredStressConcentrationFromOrder(n, f, { value: 0, uncertainty: 1 }, w).defined).toBe(false);
  });
});
