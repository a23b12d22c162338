import { describe, expect, it } from 'vitest';
import { edgeStressFromFringeOrder } from '../../../src/optics/edgeStressFromFringeOrder.ts';
import { monteCarlo } from '../uncertainty/support/monteCarlo.ts';

describe('edgeStressFromFringeOrder', () => {
  it('gives σ_edge = N·fσ/t at a free edge [C: σ2 = 0 there]', () => {
    const r = edgeStressFromFringeOrder({ value: 4.2, uncertainty: 0.02 }, { value: 10.8, uncertainty: 0.15 }, { value: 6.35, uncertainty: 0.02 });
    expect(r.stressMPa.value).toBeCloseTo(7.1433, 4);
    expect(r.stressMPa.uncertainty).toBeCloseTo(0.1073, 4);
  });
  it('agrees with a repeatable Monte Carlo on the uncertainty [M: GUM-S1]', () => {
    const inputs = [{ value: 0.35, uncertainty: 0.02 }, { value: 130, uncertainty: 6 }, { value: 9.5, uncertainty: 0.1 }];
    const [n, f, t] = inputs as [typeof inputs[0], typeof inputs[0], typeof inputs[0]];
    const r = edgeStressFromFringeOrder(n, f, t).stressMPa;
    const mc = monteCarlo(inputs, (a, b, c) => (a * b) / c, { start: 77 });
    expect(Math.abs(mc.uncertainty / r.uncertainty - 1)).toBeLessThan(0.03);
  });
});
