import { describe, expect, it } from 'vitest';
import { calibrateAgainstFringeOrder } from '../../../src/calibration/calibrateAgainstFringeOrder.ts';

const m = (value: number, uncertainty = 0) => ({ value, uncertainty });

describe('calibrateAgainstFringeOrder', () => {
  it('divides the product by N with relative uncertainties in quadrature [M: GUM 5.1.6]', () => {
    const r = calibrateAgainstFringeOrder('q/N', 2, [{ field: 'x', measured: m(10, 0.3), exponent: 1 }], m(4, 0.16), 577);
    expect(r).toEqual({ defined: true, fringeValueNPerMm: { value: 5, uncertainty: expect.closeTo(5 * 0.05, 12) }, wavelengthNm: 577, formula: 'q/N' });
  });
  it('is undefined exactly when N ≤ 2·u(N)', () => {
    const f = [{ field: 'x', measured: m(10), exponent: 1 }];
    expect(calibrateAgainstFringeOrder('q/N', 1, f, m(0.04, 0.02), 577).defined).toBe(false);
    expect(calibrateAgainstFringeOrder('q/N', 1, f, m(0.041, 0.02), 577).defined).toBe(true);
  });
  it('refuses non-positive factors', () => {
    expect(() => calibrateAgainstFringeOrder('q/N', 1, [{ field: 'widthMm', measured: m(0), exponent: -1 }], m(2), 577)).toThrow(/widthMm/);
  });
});
