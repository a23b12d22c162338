import { describe, expect, it } from 'vitest';
import { fringeValueFromDisk } from '../../../src/calibration/fringeValueFromDisk.ts';
import { monteCarlo } from '../uncertainty/support/monteCarlo.ts';
import { diskStress, principalDifferenceMPa } from './support/diskStressField.ts';

const m = (value: number, uncertainty = 0) => ({ value, uncertainty });

describe('fringeValueFromDisk', () => {
  it('the reference field is traction-free on the rim away from the loads [C]', () => {
    const [p, d, t] = [1200, 50, 6];
    for (const deg of [0, 20, 45, 70, 110, 160, 200, 300]) {
      const th = (deg * Math.PI) / 180;
      const [nx, ny] = [Math.cos(th), Math.sin(th)];
      const s = diskStress(p, d, t, (d / 2) * nx, (d / 2) * ny);
      expect(Math.abs(s.sigmaXMPa * nx + s.tauXYMPa * ny)).toBeLessThan(1e-9);
      expect(Math.abs(s.tauXYMPa * nx + s.sigmaYMPa * ny)).toBeLessThan(1e-9);
    }
  });

  it('the field gives σx = 2P/(πDt), σy = −6P/(πDt) at the centre [C, standard result]', () => {
    const [p, d, t] = [1200, 50, 6];
    const s = diskStress(p, d, t, 0, 0);
    expect(s.sigmaXMPa).toBeCloseTo((2 * p) / (Math.PI * d * t), 12);
    expect(s.sigmaYMPa).toBeCloseTo((-6 * p) / (Math.PI * d * t), 12);
    expect(principalDifferenceMPa(s)).toBeCloseTo((8 * p) / (Math.PI * d * t), 12);
  });

  it('recovers the fringe value that produced the centre fringe order in the reference field [C]', () => {
    const [p, d, t, f] = [900, 40, 6.35, 11.2];
    const orderAtCentre = (principalDifferenceMPa(diskStress(p, d, t, 0, 0)) * t) / f;
    const r = fringeValueFromDisk({ loadN: m(p), diameterMm: m(d), fringeOrder: m(orderAtCentre), wavelengthNm: 577 });
    expect(r.defined && r.fringeValueNPerMm.value).toBeCloseTo(f, 10);
  });

  it('propagates u(P), u(D), u(N), agreeing with a repeatable Monte Carlo [M: GUM-S1]', () => {
    const input = { loadN: m(1200, 6), diameterMm: m(50, 0.02), fringeOrder: m(5.5, 0.02), wavelengthNm: 577 };
    const r = fringeValueFromDisk(input);
    if (!r.defined) throw new Error('expected a defined calibration');
    expect(r.fringeValueNPerMm.value).toBeCloseTo(11.1119, 4);
    expect(r.fringeValueNPerMm.uncertainty).toBeCloseTo(0.06884, 5);
    expect(r.wavelengthNm).toBe(577);
    expect(r.formula).toContain('8P/(πDN)');
    const mc = monteCarlo([input.loadN, input.diameterMm, input.fringeOrder], (p, d, n) => (8 * p) / (Math.PI * d * n));
    expect(Math.abs(mc.uncertainty / r.fringeValueNPerMm.uncertainty - 1)).toBeLessThan(0.02);
  });

  it('is undefined, not divided, when the centre order is within 2u of zero', () => {
    const r = fringeValueFromDisk({ loadN: m(20, 1), diameterMm: m(50), fringeOrder: m(0.03, 0.02), wavelengthNm: 577 });
    expect(r.defined).toBe(false);
    if (!r.defined) expect(r.reason).toMatch(/cannot be told from zero/);
  });

  it('refuses a non-positive load or diameter and a wavelength outside the visible', () => {
    const ok = { loadN: m(1200), diameterMm: m(50), fringeOrder: m(5), wavelengthNm: 577 };
    expect(() => fringeValueFromDisk({ ...ok, loadN: m(-1200) })).toThrow(/loadN/);
    expect(() => fringeValueFromDisk({ ...ok, diameterMm: m(0) })).toThrow(/diameterMm/);
    expect(() => fringeValueFromDisk({ ...ok, wavelengthNm: 1064 })).toThrow(/wavelengthNm/);
    expect(() => fringeValueFromDisk({ ...ok, fringeOrder: m(-5) })).toThrow(/fringeOrder/);
  });
});
