import { describe, expect, it } from 'vitest';
import { fringeValueFromTensionStrip } from '../../../src/calibration/fringeValueFromTensionStrip.ts';
import { principalStressDifference } from '../../../src/optics/principalStressDifference.ts';

const m = (value: number, uncertainty = 0) => ({ value, uncertainty });

describe('fringeValueFromTensionStrip', () => {
  it('gives fσ = P/(w·N) [C: σ = P/(w·t), σ2 = 0]', () => {
    const r = fringeValueFromTensionStrip({ loadN: m(600, 3), widthMm: m(12, 0.02), fringeOrder: m(4.6, 0.02), wavelengthNm: 577 });
    if (!r.defined) throw new Error('expected a defined calibration');
    expect(r.fringeValueNPerMm.value).toBeCloseTo(600 / (12 * 4.6), 12);
    expect(r.fringeValueNPerMm.uncertainty).toBeCloseTo(10.8696 * Math.hypot(3 / 600, 0.02 / 12, 0.02 / 4.6), 4);
  });

  it('closes the loop with the stress-optic law for any thickness [C]', () => {
    const [p, w] = [450, 10];
    for (const t of [3, 6.35, 12]) {
      const f = 7.0;
      const n = (p / (w * t)) * t / f;
      const r = fringeValueFromTensionStrip({ loadN: m(p), widthMm: m(w), fringeOrder: m(n), wavelengthNm: 589.3 });
      if (!r.defined) throw new Error('expected a defined calibration');
      expect(principalStressDifference(m(n), r.fringeValueNPerMm, m(t)).stressDifferenceMPa.value).toBeCloseTo(p / (w * t), 10);
    }
  });

  it('is undefined at an unloaded strip', () => {
    expect(fringeValueFromTensionStrip({ loadN: m(1), widthMm: m(10), fringeOrder: m(0, 0.02), wavelengthNm: 577 }).defined).toBe(false);
  });
});
