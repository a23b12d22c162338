import { describe, expect, it } from 'vitest';
import { slabCentreTemperatureRatio } from '../../../src/annealing/slabCentreTemperatureRatio.ts';
import { exactCentreRatioInfiniteBiot } from './slabSeries.ts';

describe('slabCentreTemperatureRatio', () => {
  it('gives C1·exp(−ζ1²·Fo) with the Table 5.1 values at Bi 1 [Incropera Table 5.1, via the reference sheet]', () => {
    const r = slabCentreTemperatureRatio({ biot: 1, fourier: 0.5 });
    expect(r.ratio).toBeCloseTo(1.1191 * Math.exp(-0.8603 * 0.8603 * 0.5), 3);
    expect(r.oneTermValid).toBe(true);
  });

  it.each([0.25, 0.5, 1, 2])('agrees with the full series within 1 % for Fo = %s > 0.2 (Bi → ∞) [C]', (fo) => {
    const oneTerm = slabCentreTemperatureRatio({ biot: Number.POSITIVE_INFINITY, fourier: fo }).ratio;
    const exact = exactCentreRatioInfiniteBiot(fo);
    expect(Math.abs(oneTerm - exact) / exact).toBeLessThan(0.01);
  });

  it('flags Fo ≤ 0.2 as outside the one-term range, where it overestimates the centre difference [C]', () => {
    const r = slabCentreTemperatureRatio({ biot: Number.POSITIVE_INFINITY, fourier: 0.05 });
    expect(r.oneTermValid).toBe(false);
    expect(r.ratio).toBeGreaterThan(exactCentreRatioInfiniteBiot(0.05));
  });
});
