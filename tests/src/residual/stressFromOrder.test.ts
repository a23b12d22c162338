import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { stressFromOrder } from '../../../src/residual/stressFromOrder.ts';
import { DomainError } from '../../../src/errors/DomainError.ts';
import { monteCarlo } from '../uncertainty/support/monteCarlo.ts';

const f = { value: 7.0, uncertainty: 0.2 };
const t = { value: 6.0, uncertainty: 0.05 };

describe('stressFromOrder', () => {
  it('worked case: 2.5 fringes, fσ 7.0 N/mm, t 6.0 mm → 2.917 ± 0.090 MPa edge stress [C, hand-computed]', () => {
    // 2.5·7/6 = 2.91667; u² = (7/6·0.02)² + (2.5/6·0.2)² + (2.91667/6·0.05)² = 0.0080789
    const r = stressFromOrder({ value: 2.5, uncertainty: 0.02 }, f, t, true);
    expect(r.stressMPa.value).toBeCloseTo(2.916667, 6);
    expect(r.stressMPa.uncertainty).toBeCloseTo(Math.sqrt(0.0080789), 5);
    expect(r.kind).toBe('edge_stress');
  });

  it('agrees with δ = C·t·(σ1 − σ2), C = λ/fσ, in SI units [R: ASTM D4093 relation]', () => {
    // One fringe at 577 nm in 6 mm of a material with fσ = 7000 N/m: C ≈ 82.4 Br (the
    // polycarbonate order of magnitude [M: Dally & Riley]).
    const lambdaM = 577e-9;
    const cPerPa = lambdaM / 7000;
    const sigmaPa = (1 * lambdaM) / (cPerPa * 0.006);
    const r = stressFromOrder({ value: 1, uncertainty: 0 }, { value: 7, uncertainty: 0 }, { value: 6, uncertainty: 0 }, true);
    expect(r.stressMPa.value).toBeCloseTo(sigmaPa / 1e6, 9);
    expect(cPerPa / 1e-12).toBeCloseTo(82.43, 1);
  });

  it('labels the result a principal stress difference away from a free edge', () => {
    expect(stressFromOrder({ value: 1, uncertainty: 0.01 }, f, t, false).kind).toBe('principal_stress_difference');
  });

  it('keeps u(N) when N = 0 (absolute sensitivities) [C]', () => {
    const r = stressFromOrder({ value: 0, uncertainty: 0.02 }, f, t, true);
    expect(r.stressMPa.value).toBe(0);
    expect(r.stressMPa.uncertainty).toBeCloseTo((7 / 6) * 0.02, 12);
  });

  it('first-order uncertainty agrees with a repeatable Monte Carlo within 2 % [M: GUM Supplement 1 method]', () => {
    const n = { value: 2.5, uncertainty: 0.02 };
    const mc = monteCarlo([n, f, t], (a, b, c) => (a * b) / c);
    const r = stressFromOrder(n, f, t, true);
    expect(Math.abs(mc.uncertainty / r.stressMPa.uncertainty - 1)).toBeLessThan(0.02);
    expect(Math.abs(mc.value / r.stressMPa.value - 1)).toBeLessThan(0.002);
  });

  it('is linear in N and fσ and inversely proportional to t (property)', () => {
    const pos = fc.double({ min: 0.1, max: 100, noNaN: true });
    fc.assert(
      fc.property(fc.double({ min: -20, max: 20, noNaN: true }), pos, pos, fc.double({ min: 0.1, max: 10, noNaN: true }), (n, fv, tv, s) => {
        const exact = (x: number) => ({ value: x, uncertainty: 0 });
        const base = stressFromOrder(exact(n), exact(fv), exact(tv), true).stressMPa.value;
        const tol = 1e-9 * (Math.abs(base) * s + 1);
        expect(Math.abs(stressFromOrder(exact(n * s), exact(fv), exact(tv), true).stressMPa.value - base * s)).toBeLessThan(tol);
        expect(Math.abs(stressFromOrder(exact(n), exact(fv * s), exact(tv), true).stressMPa.value - base * s)).toBeLessThan(tol);
        expect(Math.abs(stressFromOrder(exact(n), exact(fv), exact(tv * s), true).stressMPa.value - base / s)).toBeLessThan(tol);
      }),
    );
  });

  it.each([
    [{ value: 1, uncertainty: 0.01 }, { value: 0, uncertainty: 0.1 }, t],
    [{ value: 1, uncertainty: 0.01 }, f, { value: -6, uncertainty: 0.05 }],
    [{ value: Number.NaN, uncertainty: 0.01 }, f, t],
  ])('refuses bad input with invalid_input', (n, fv, tv) => {
    expect(() => stressFromOrder(n, fv, tv, true)).toThrow(DomainError);
  });
});
