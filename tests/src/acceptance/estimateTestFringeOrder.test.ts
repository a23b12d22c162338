import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { estimateTestFringeOrder } from '../../../src/acceptance/estimateTestFringeOrder.ts';
import { DomainError } from '../../../src/errors/DomainError.ts';
import { monteCarlo } from '../uncertainty/support/monteCarlo.ts';

const m = (value: number, uncertainty: number) => ({ value, uncertainty });

describe('estimateTestFringeOrder', () => {
  it('worked case: 400 N, 20 mm net, 6 mm, Kt 2.1, fσ 7.0 → σ_nom 3.333 MPa, 6.0 fringes [C, hand-computed]', () => {
    // σ_nom = 400/(20·6) = 3.3333 MPa; σ_root = 7.0 MPa; N = 7.0·6/7.0 = 6.0; u(N) = 6·0.2/7
    const r = estimateTestFringeOrder({ plannedLoadN: 400, netWidthMm: 20, thicknessMm: 6, kt: 2.1, fringeValueNPerMm: m(7.0, 0.2) });
    expect(r.nominalStressMPa).toEqual({ value: 400 / 120, uncertainty: 0 });
    expect(r.rootStressMPa.value).toBeCloseTo(7.0, 12);
    expect(r.testFringeOrder.value).toBeCloseTo(6.0, 12);
    expect(r.testFringeOrder.uncertainty).toBeCloseTo((6 * 0.2) / 7, 12);
  });

  it('is consistent with the stress-optic law σ = N·fσ/t at the notch root [C: stress-optic law, checked independently of the code]', () => {
    const r = estimateTestFringeOrder({ plannedLoadN: 250, netWidthMm: 12.5, thicknessMm: 4.8, kt: 2.6, fringeValueNPerMm: 10.9 });
    expect((r.testFringeOrder.value * 10.9) / 4.8).toBeCloseTo(r.rootStressMPa.value, 10);
  });

  it('uncertainty of N_test (thickness cancels) matches a repeatable Monte Carlo within 2 % [M: GUM Supplement 1 method]', () => {
    const inputs = { plannedLoadN: m(400, 8), netWidthMm: m(20, 0.05), thicknessMm: m(6, 0.1), kt: m(2.1, 0.05), fringeValueNPerMm: m(7, 0.2) };
    const r = estimateTestFringeOrder(inputs);
    const mc = monteCarlo(
      [inputs.plannedLoadN, inputs.netWidthMm, inputs.thicknessMm, inputs.kt, inputs.fringeValueNPerMm],
      (p, w, t, kt, f) => (kt * (p / (w * t)) * t) / f,
    );
    expect(Math.abs(mc.uncertainty / r.testFringeOrder.uncertainty - 1)).toBeLessThan(0.02);
    const mcNominal = monteCarlo([inputs.plannedLoadN, inputs.netWidthMm, inputs.thicknessMm], (p, w, t) => p / (w * t));
    expect(Math.abs(mcNominal.uncertainty / r.nominalStressMPa.uncertainty - 1)).toBeLessThan(0.02);
  });

  it('N_test does not depend on thickness (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.5, max: 50, noNaN: true }), fc.double({ min: 0.5, max: 50, noNaN: true }), (t1, t2) => {
        const base = { plannedLoadN: 300, netWidthMm: 15, kt: 2, fringeValueNPerMm: 7 };
        const a = estimateTestFringeOrder({ ...base, thicknessMm: t1 }).testFringeOrder.value;
        const b = estimateTestFringeOrder({ ...base, thicknessMm: t2 }).testFringeOrder.value;
        expect(a).toBeCloseTo(b, 10);
      }),
    );
  });

  it.each([
    ['zero load', { plannedLoadN: 0 }],
    ['negative width', { netWidthMm: -20 }],
    ['NaN Kt', { kt: Number.NaN }],
    ['negative uncertainty', { fringeValueNPerMm: m(7, -0.1) }],
  ])('refuses %s with invalid_input', (_label, patch) => {
    const base = { plannedLoadN: 400, netWidthMm: 20, thicknessMm: 6, kt: 2.1, fringeValueNPerMm: 7 };
    expect(() => estimateTestFringeOrder({ ...base, ...patch })).toThrow(DomainError);
  });
});
