import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { ratioOrUndefined } from '../../../src/residual/ratioOrUndefined.ts';
import { DomainError } from '../../../src/errors/DomainError.ts';
import { monteCarlo } from '../uncertainty/support/monteCarlo.ts';

const relErr = (a: number, b: number) => Math.abs(a / b - 1);

describe('ratioOrUndefined', () => {
  it('worked case without covariance: 0.15 ± 0.01 over 2.0 ± 0.04 → 0.075 ± 0.00528 [C]', () => {
    // u² = (0.01/2)² + (0.075·0.04/2)² = 2.5e-5 + 2.25e-6
    const r = ratioOrUndefined({ value: 0.15, uncertainty: 0.01 }, { value: 2.0, uncertainty: 0.04 });
    expect(r.defined).toBe(true);
    if (!r.defined) return;
    expect(r.ratio.value).toBeCloseTo(0.075, 12);
    expect(r.ratio.uncertainty).toBeCloseTo(Math.sqrt(2.725e-5), 10);
  });

  it('inelastic fraction (p − f)/(l − f) with cov = u(f)² agrees with the direct partial derivatives [C]', () => {
    const [f, l, p, u] = [0.3, 2.4, 0.45, 0.02];
    const r = ratioOrUndefined({ value: p - f, uncertainty: u * Math.SQRT2 }, { value: l - f, uncertainty: u * Math.SQRT2 }, { covariance: u * u });
    // ∂R/∂p = 1/(l−f), ∂R/∂l = −(p−f)/(l−f)², ∂R/∂f = (p−l)/(l−f)²
    const b = l - f;
    const direct = u * Math.hypot(1 / b, (p - f) / b ** 2, (p - l) / b ** 2);
    expect(r.defined && r.ratio.uncertainty).toBeCloseTo(direct, 12);
  });

  it('inelastic fraction: GUM with the shared N_fab matches a repeatable Monte Carlo of the stage readings within 3 % [M: GUM Supplement 1 method]', () => {
    const fab = { value: 0.3, uncertainty: 0.02 };
    const load = { value: 2.4, uncertainty: 0.03 };
    const post = { value: 0.55, uncertainty: 0.02 };
    const mc = monteCarlo([fab, load, post], (f, l, p) => (p - f) / (l - f));
    const r = ratioOrUndefined(
      { value: post.value - fab.value, uncertainty: Math.hypot(0.02, 0.02) },
      { value: load.value - fab.value, uncertainty: Math.hypot(0.03, 0.02) },
      { covariance: fab.uncertainty ** 2 },
    );
    expect(r.defined).toBe(true);
    if (!r.defined) return;
    expect(relErr(mc.uncertainty, r.ratio.uncertainty)).toBeLessThan(0.03);
    // Ignoring the covariance would be visibly wrong here: check the test can tell.
    const naive = ratioOrUndefined(
      { value: 0.25, uncertainty: Math.hypot(0.02, 0.02) },
      { value: 2.1, uncertainty: Math.hypot(0.03, 0.02) },
    );
    expect(naive.defined && relErr(mc.uncertainty, naive.ratio.uncertainty)).toBeGreaterThan(0.05);
  });

  it('anneal relief (pre − post)/pre with cov = u(pre)²: matches a repeatable Monte Carlo within 3 %', () => {
    const pre = { value: 0.4, uncertainty: 0.01 };
    const post = { value: 0.05, uncertainty: 0.01 };
    const mc = monteCarlo([pre, post], (a, b) => (a - b) / a);
    const r = ratioOrUndefined({ value: 0.35, uncertainty: Math.hypot(0.01, 0.01) }, pre, { covariance: 0.01 ** 2 });
    expect(r.defined && relErr(mc.uncertainty, r.ratio.uncertainty)).toBeLessThan(0.03);
    // Direct partials: R = 1 − post/pre → u = √((1/pre)²u_post² + (post/pre²)²u_pre²) [C]
    expect(r.defined && r.ratio.uncertainty).toBeCloseTo(Math.hypot(0.01 / 0.4, (0.05 / 0.16) * 0.01), 12);
  });

  it('is undefined, with a reason, when the denominator is within 2·u of zero', () => {
    const r = ratioOrUndefined({ value: 0.1, uncertainty: 0.01 }, { value: 0.03, uncertainty: 0.02 });
    expect(r).toEqual({ defined: false, reason: expect.stringContaining('within 2·u of zero') });
    expect(ratioOrUndefined({ value: 1, uncertainty: 0 }, { value: 0, uncertainty: 0 }).defined).toBe(false);
  });

  it('never returns NaN or Infinity: near-zero denominators are undefined (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -10, max: 10, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.double({ min: -1, max: 1, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        (a, ua, b, ub) => {
          const r = ratioOrUndefined({ value: a, uncertainty: ua }, { value: b, uncertainty: ub });
          if (Math.abs(b) <= 2 * ub) expect(r.defined).toBe(false);
          if (r.defined) {
            expect(Number.isFinite(r.ratio.value)).toBe(true);
            expect(Number.isFinite(r.ratio.uncertainty)).toBe(true);
          }
        },
      ),
    );
  });

  it('refuses a non-finite covariance', () => {
    expect(() => ratioOrUndefined({ value: 1, uncertainty: 0 }, { value: 1, uncertainty: 0 }, { covariance: Number.NaN })).toThrow(DomainError);
  });
});
