import { describe, expect, it } from 'vitest';
import { fringeValueFromBeam } from '../../../src/calibration/fringeValueFromBeam.ts';
import { monteCarlo } from '../uncertainty/support/monteCarlo.ts';

const m = (value: number, uncertainty = 0) => ({ value, uncertainty });

describe('fringeValueFromBeam', () => {
  it('recovers fσ from a beam whose outer-fibre stress is found by integrating the linear stress profile [C]', () => {
    // Four-point bending: total load P = 400 N, support to load point a = 30 mm: M = P·a/2 (statics).
    const [p, a, h, t, f] = [400, 30, 12, 6, 7.0];
    const moment = (p * a) / 2;
    // Find σmax such that ∫ σmax·(2y/h)·y·t dy over the depth equals M (midpoint rule, 2000 strips).
    const strips = 2000;
    let unitMoment = 0;
    for (let i = 0; i < strips; i++) {
      const y = -h / 2 + ((i + 0.5) * h) / strips;
      unitMoment += ((2 * y) / h) * y * t * (h / strips);
    }
    const sigmaMax = moment / unitMoment;
    const orderAtOuterFibre = (sigmaMax * t) / f;
    const r = fringeValueFromBeam({ bendingMomentNmm: m(moment), depthMm: m(h), fringeOrder: m(orderAtOuterFibre), wavelengthNm: 577 });
    if (!r.defined) throw new Error('expected a defined calibration');
    expect(r.fringeValueNPerMm.value).toBeCloseTo(f, 5);
  });

  it('has a thickness-free result when M is the moment on the whole section [C]', () => {
    // At a fixed whole-section M, σ = 6M/(t·h²) falls with t but the order N = σ·t/fσ does
    // not, so the same (M, N) must give the same fσ for every thickness.
    const fs = [3, 6, 12].map((t) => {
      const sigma = (6 * 6000) / (t * 10 * 10);
      const r = fringeValueFromBeam({ bendingMomentNmm: m(6000), depthMm: m(10), fringeOrder: m((sigma * t) / 11), wavelengthNm: 577 });
      return r.defined ? r.fringeValueNPerMm.value : Number.NaN;
    });
    for (const f of fs) expect(f).toBeCloseTo(11, 10);
  });

  it('counts u(h) twice (h²), agreeing with a repeatable Monte Carlo [M: GUM-S1]', () => {
    const input = { bendingMomentNmm: m(4000, 20), depthMm: m(12, 0.05), fringeOrder: m(3.2, 0.02), wavelengthNm: 546.1 };
    const r = fringeValueFromBeam(input);
    if (!r.defined) throw new Error('expected a defined calibration');
    expect(r.fringeValueNPerMm.value).toBeCloseTo(52.0833, 4);
    const mc = monteCarlo([input.bendingMomentNmm, input.depthMm, input.fringeOrder], (mm, hh, n) => (6 * mm) / (hh * hh * n));
    expect(Math.abs(mc.uncertainty / r.fringeValueNPerMm.uncertainty - 1)).toBeLessThan(0.02);
    expect(r.wavelengthNm).toBe(546.1);
  });
});
