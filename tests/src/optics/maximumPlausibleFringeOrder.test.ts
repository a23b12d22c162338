import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { maximumPlausibleFringeOrder } from '../../../src/optics/maximumPlausibleFringeOrder.ts';

const polycarbonate = { materialFamily: 'polycarbonate', thicknessMm: 6, fringeValueNPerMm: 7, fringeValueWavelengthNm: 577, readingWavelengthNm: 577 };

describe('maximumPlausibleFringeOrder', () => {
  it('is the stress-optic law at the generous limit [C: stress-optic law N = σ·t/fσ, Dally & Riley, Experimental Stress Analysis [M]]', () => {
    const limit = maximumPlausibleFringeOrder(polycarbonate);
    // 180 MPa × 6 mm / 7 N/mm = 154.2857 fringes.
    expect(limit).toMatchObject({ defined: true, maxFringeOrder: 154.29, stressLimitMPa: 180 });
    if (limit.defined) expect(limit.reason).toMatch(/180 MPa .*polycarbonate.* 6 mm .*fσ 7 N\/mm at 577 nm/);
  });

  it('converts fσ to the reading wavelength in proportion to λ [C: fσ = λ/C]', () => {
    const limit = maximumPlausibleFringeOrder({ ...polycarbonate, readingWavelengthNm: 546.1 });
    // fσ(546.1) = 7 × 546.1/577 = 6.6251 N/mm, so 180 × 6 / 6.6251 = 163.02 fringes.
    expect(limit).toMatchObject({ defined: true, maxFringeOrder: 163.02 });
  });

  it('lets a stress-frozen epoxy pattern through but not a decimal slip [M: frozen slices show tens of fringes, not hundreds]', () => {
    const epoxy = { materialFamily: 'anhydride_cured_epoxy', thicknessMm: 8, fringeValueNPerMm: 11, fringeValueWavelengthNm: 546.1, readingWavelengthNm: 546.1 };
    const limit = maximumPlausibleFringeOrder(epoxy);
    expect(limit.defined && limit.maxFringeOrder).toBeGreaterThan(30);
    expect(limit.defined && limit.maxFringeOrder).toBeLessThan(300);
  });

  it('has no limit for a family it does not know', () => {
    expect(maximumPlausibleFringeOrder({ ...polycarbonate, materialFamily: 'other' })).toEqual({ defined: false, reason: 'no stress limit is set for the family "other"' });
  });

  it('grows with thickness and falls with fringe value (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.5, max: 100, noNaN: true }), fc.double({ min: 0.5, max: 400, noNaN: true }), (t, f) => {
        const base = maximumPlausibleFringeOrder({ ...polycarbonate, thicknessMm: t, fringeValueNPerMm: f });
        const thicker = maximumPlausibleFringeOrder({ ...polycarbonate, thicknessMm: t * 2, fringeValueNPerMm: f });
        const stiffer = maximumPlausibleFringeOrder({ ...polycarbonate, thicknessMm: t, fringeValueNPerMm: f * 2 });
        if (!base.defined || !thicker.defined || !stiffer.defined) throw new Error('defined for polycarbonate');
        expect(thicker.maxFringeOrder).toBeGreaterThanOrEqual(base.maxFringeOrder);
        expect(stiffer.maxFringeOrder).toBeLessThanOrEqual(base.maxFringeOrder);
      }),
    );
  });

  it('refuses a thickness that is not positive', () => {
    expect(() => maximumPlausibleFringeOrder({ ...polycarbonate, thicknessMm: 0 })).toThrow(/thicknessMm/);
  });
});
