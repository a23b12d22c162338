import { describe, expect, it } from 'vitest';
import { retardationFromFringeOrder } from '../../../src/optics/retardationFromFringeOrder.ts';

describe('retardationFromFringeOrder', () => {
  it('gives δ = N·λ [R: ASTM D4093, N = δ/λ]', () => {
    const r = retardationFromFringeOrder({ value: 0.25, uncertainty: 0.02 }, 577).retardationNm;
    expect(r.value).toBeCloseTo(144.25, 10);
    expect(r.uncertainty).toBeCloseTo(11.54, 10);
  });
  it('places the first-order tint of passage at 577 nm and the second at 1154 nm [M: Dally & Riley table, 577/1150]', () => {
    expect(retardationFromFringeOrder({ value: 1, uncertainty: 0 }, 577).retardationNm.value).toBe(577);
    // The table's 1150 nm for N = 2 is the same law rounded.
    expect(Math.abs(retardationFromFringeOrder({ value: 2, uncertainty: 0 }, 577).retardationNm.value - 1150)).toBeLessThan(5);
  });
  it('refuses a non-positive wavelength', () => {
    expect(() => retardationFromFringeOrder({ value: 1, uncertainty: 0 }, 0)).toThrow(/wavelengthNm/);
  });
});
