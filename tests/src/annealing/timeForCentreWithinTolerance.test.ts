import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { slabCentreTemperatureRatio } from '../../../src/annealing/slabCentreTemperatureRatio.ts';
import { timeForCentreWithinTolerance } from '../../../src/annealing/timeForCentreWithinTolerance.ts';
import { exactCentreRatioInfiniteBiot } from './slabSeries.ts';

const base = { halfThicknessMm: 10, diffusivityMm2PerS: 0.144 };

describe('timeForCentreWithinTolerance', () => {
  it('inverts the one-term solution: at the returned Fo the centre ratio is tol/ΔT0 (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1.5, max: 200, noNaN: true }),
        fc.double({ min: 0.05, max: 1000, noNaN: true }),
        (difference, biot) => {
          const r = timeForCentreWithinTolerance({ ...base, initialDifferenceC: difference, toleranceC: 1, biot });
          expect(slabCentreTemperatureRatio({ biot, fourier: r.fourier }).ratio).toBeCloseTo(1 / difference, 9);
          expect(r.durationH * 3600).toBeCloseTo((r.fourier * 100) / 0.144, 6);
        },
      ),
    );
  });

  it('10 °C to within 1 °C in a 20 mm polycarbonate section takes Fo 1.031 → 0.199 h [C, worked by hand: ln(1.2732·10)/2.4674]', () => {
    const r = timeForCentreWithinTolerance({ ...base, initialDifferenceC: 10, toleranceC: 1 });
    expect(r.fourier).toBeCloseTo(Math.log(1.2732 * 10) / 2.4674, 3);
    expect(r.durationH).toBeCloseTo((1.031 * 100) / 0.144 / 3600, 3);
  });

  it('never undercuts the exact time from the full series (Bi → ∞) [C]', () => {
    for (const difference of [1.1, 1.5, 3, 10, 100]) {
      const r = timeForCentreWithinTolerance({ ...base, initialDifferenceC: difference, toleranceC: 1 });
      expect(exactCentreRatioInfiniteBiot(r.fourier)).toBeLessThanOrEqual(1 / difference + 1e-12);
    }
  });

  it('is zero when the centre already lies within tolerance, and longer for a weaker surface coupling', () => {
    expect(timeForCentreWithinTolerance({ ...base, initialDifferenceC: 0.8, toleranceC: 1 }).durationH).toBe(0);
    const held = timeForCentreWithinTolerance({ ...base, initialDifferenceC: 5, toleranceC: 1 }).durationH;
    const air = timeForCentreWithinTolerance({ ...base, initialDifferenceC: 5, toleranceC: 1, biot: 0.3 }).durationH;
    expect(air).toBeGreaterThan(held);
  });
});
