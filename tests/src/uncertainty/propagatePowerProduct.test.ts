import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { propagatePowerProduct } from '../../../src/uncertainty/propagatePowerProduct.ts';
import { combinedStandardUncertainty } from '../../../src/uncertainty/combinedStandardUncertainty.ts';
import { monteCarlo } from './support/monteCarlo.ts';

describe('propagatePowerProduct', () => {
  it('equals GUM eq. 10 with the partial derivatives written out [C]', () => {
    // y = 6·M/(h²·N): ∂y/∂M = y/M, ∂y/∂h = −2y/h, ∂y/∂N = −y/N.
    const m = { value: 4000, uncertainty: 20 }, h = { value: 12, uncertainty: 0.02 }, n = { value: 3.2, uncertainty: 0.02 };
    const y = propagatePowerProduct(6, [
      { field: 'M', measured: m, exponent: 1 },
      { field: 'h', measured: h, exponent: -2 },
      { field: 'N', measured: n, exponent: -1 },
    ]);
    const v = (6 * 4000) / (144 * 3.2);
    expect(y.value).toBeCloseTo(v, 12);
    expect(y.uncertainty).toBeCloseTo(
      combinedStandardUncertainty([
        { sensitivity: v / 4000, uncertainty: 20 },
        { sensitivity: (-2 * v) / 12, uncertainty: 0.02 },
        { sensitivity: -v / 3.2, uncertainty: 0.02 },
      ]),
      12,
    );
  });

  it('agrees with a repeatable Monte Carlo for the disk formula 8P/(πDN) [M: GUM-S1]', () => {
    const p = { value: 1200, uncertainty: 12 }, d = { value: 50, uncertainty: 0.05 }, n = { value: 5.5, uncertainty: 0.05 };
    const y = propagatePowerProduct(8 / Math.PI, [
      { field: 'P', measured: p, exponent: 1 },
      { field: 'D', measured: d, exponent: -1 },
      { field: 'N', measured: n, exponent: -1 },
    ]);
    const mc = monteCarlo([p, d, n], (a, b, c) => (8 * a) / (Math.PI * b * c));
    expect(Math.abs(mc.uncertainty / y.uncertainty - 1)).toBeLessThan(0.02);
  });

  it('refuses a zero factor rather than dividing by it', () => {
    expect(() => propagatePowerProduct(1, [{ field: 'fringeOrder', measured: { value: 0, uncertainty: 0.1 }, exponent: -1 }])).toThrow(/fringeOrder/);
  });

  it('has a relative uncertainty independent of the constant and of scaling any factor (property)', () => {
    const pos = fc.double({ min: 0.01, max: 1e3, noNaN: true });
    fc.assert(
      fc.property(pos, pos, fc.double({ min: 0.1, max: 100, noNaN: true }), fc.integer({ min: -3, max: 3 }), (x, c, k, p) => {
        const a = propagatePowerProduct(c, [{ field: 'x', measured: { value: x, uncertainty: x / 50 }, exponent: p }]);
        const b = propagatePowerProduct(1, [{ field: 'x', measured: { value: k * x, uncertainty: (k * x) / 50 }, exponent: p }]);
        expect(a.uncertainty / a.value).toBeCloseTo(b.uncertainty / b.value, 9);
        expect(a.uncertainty / a.value).toBeCloseTo(Math.abs(p) / 50, 9);
      }),
    );
  });
});
