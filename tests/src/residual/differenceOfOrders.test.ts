import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { differenceOfOrders } from '../../../src/residual/differenceOfOrders.ts';
import { DomainError } from '../../../src/errors/DomainError.ts';
import { monteCarlo } from '../uncertainty/support/monteCarlo.ts';

describe('differenceOfOrders', () => {
  it('worked case: 0.45 ± 0.02 − 0.30 ± 0.02 = 0.15 ± 0.0283 [C]', () => {
    const d = differenceOfOrders({ value: 0.45, uncertainty: 0.02 }, { value: 0.3, uncertainty: 0.02 });
    expect(d.value).toBeCloseTo(0.15, 12);
    expect(d.uncertainty).toBeCloseTo(0.02 * Math.SQRT2, 12);
  });
  it('agrees with a repeatable Monte Carlo for independent readings', () => {
    const a = { value: 2.4, uncertainty: 0.03 };
    const b = { value: -0.3, uncertainty: 0.05 };
    const mc = monteCarlo([a, b], (x, y) => x - y);
    expect(Math.abs(mc.uncertainty / differenceOfOrders(a, b).uncertainty - 1)).toBeLessThan(0.01);
  });
  it('is antisymmetric with the same uncertainty (property)', () => {
    const m = fc.record({ value: fc.double({ min: -10, max: 10, noNaN: true }), uncertainty: fc.double({ min: 0, max: 1, noNaN: true }) });
    fc.assert(
      fc.property(m, m, (a, b) => {
        const ab = differenceOfOrders(a, b);
        const ba = differenceOfOrders(b, a);
        expect(ab.value).toBeCloseTo(-ba.value, 12);
        expect(ab.uncertainty).toBe(ba.uncertainty);
      }),
    );
  });
  it('refuses a negative uncertainty', () => {
    expect(() => differenceOfOrders({ value: 1, uncertainty: -0.1 }, { value: 0, uncertainty: 0 })).toThrow(DomainError);
  });
});

describe('differenceOfOrders overflow', () => {
  it('throws invalid_input rather than return Infinity for absurd magnitudes', () => {
    expect(() => differenceOfOrders({ value: 1.7e308, uncertainty: 0 }, { value: -1.7e308, uncertainty: 0 })).toThrow(DomainError);
  });
});
