import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { permanentSetShare } from '../../../src/residual/permanentSetShare.ts';
import { monteCarlo } from '../uncertainty/support/monteCarlo.ts';

const m = (value: number, uncertainty: number) => ({ value, uncertainty });
const shareOf = (f: number, p: number) => Math.abs(p - f) / (Math.abs(f) + Math.abs(p - f));

describe('permanentSetShare', () => {
  it('worked case, residual kept its sign: N_fab 0.30, N_post 0.45 → 0.15/0.45 = 1/3 ± 0.0534 [C]', () => {
    // S = 1 − f/p: ∂S/∂f = −1/p, ∂S/∂p = f/p²
    const r = permanentSetShare(m(0.3, 0.02), m(0.45, 0.02), { signsKnown: true });
    expect(r.defined).toBe(true);
    if (!r.defined) return;
    expect(r.share.value).toBeCloseTo(1 / 3, 12);
    expect(r.share.uncertainty).toBeCloseTo(0.02 * Math.hypot(1 / 0.45, 0.3 / 0.45 ** 2), 12);
    expect(r.possibleRelaxationOrSignReversal).toBe(false);
    expect(r.coverageFactor).toBe(2);
  });

  it('worked case, load reversed the sign: N_fab +0.30, N_post −0.20 → 0.50/0.80 = 0.625 [C]', () => {
    const r = permanentSetShare(m(0.3, 0.01), m(-0.2, 0.01), { signsKnown: true });
    expect(r.defined && r.share.value).toBeCloseTo(0.625, 12);
    expect(r.possibleRelaxationOrSignReversal).toBe(false);
  });

  it.each([
    ['same sign, growth', 0.3, 0.45],
    ['sign reversal', 0.3, -0.2],
    ['relaxation', 0.5, 0.35],
    ['negative residual grows', -0.4, -0.7],
  ])('%s: GUM partial derivatives match a repeatable Monte Carlo within 3 % [M: GUM Supplement 1 method]', (_label, f, p) => {
    const fab = m(f, 0.005);
    const post = m(p, 0.005);
    const mc = monteCarlo([fab, post], shareOf);
    const r = permanentSetShare(fab, post, { signsKnown: true });
    expect(r.defined).toBe(true);
    if (!r.defined) return;
    expect(Math.abs(mc.uncertainty / r.share.uncertainty - 1)).toBeLessThan(0.03);
    expect(Math.abs(mc.value - r.share.value)).toBeLessThan(0.01);
  });

  it('is undefined when both N_fab and N_set are within 2·u of zero, and says why', () => {
    const r = permanentSetShare(m(0.02, 0.02), m(0.05, 0.02), { signsKnown: true });
    expect(r.defined).toBe(false);
    if (r.defined) return;
    expect(r.reason).toContain('within 2·u of zero');
    expect(r.coverageFactor).toBe(2);
  });

  it('stays defined with a note when only N_fab is near zero (share near 1)', () => {
    const r = permanentSetShare(m(0.01, 0.02), m(0.6, 0.02), { signsKnown: true });
    expect(r.defined).toBe(true);
    if (!r.defined) return;
    expect(r.share.value).toBeGreaterThan(0.95);
    expect(r.share.uncertainty).toBeGreaterThan(0);
    expect(r.notes.join(' ')).toContain('share near 1');
  });

  it('caps a runaway first-order uncertainty at 0.5, the largest SD in 0..1 [M: Popoviciu inequality]', () => {
    // d = 0.05 while u(N_post) = 0.2: the linearisation gives u ≈ 4
    const r = permanentSetShare(m(0.05, 0.001), m(0.05, 0.2), { signsKnown: true });
    expect(r.defined).toBe(true);
    if (!r.defined) return;
    expect(r.share.uncertainty).toBe(0.5);
    expect(r.notes.join(' ')).toContain('capped at 0.5');
  });

  it('flags a fall in unsigned magnitude as possible relaxation or sign reversal', () => {
    const r = permanentSetShare(m(0.5, 0.01), m(0.35, 0.01), { signsKnown: false });
    expect(r.possibleRelaxationOrSignReversal).toBe(true);
    expect(r.defined && r.notes.join(' ')).toContain('relaxed');
    expect(permanentSetShare(m(0.5, 0.01), m(0.35, 0.01), { signsKnown: true }).possibleRelaxationOrSignReversal).toBe(false);
    expect(permanentSetShare(m(0.3, 0.01), m(0.45, 0.01), { signsKnown: false }).possibleRelaxationOrSignReversal).toBe(false);
  });

  const order = fc.double({ min: -5, max: 5, noNaN: true });
  const u = fc.double({ min: 0, max: 0.5, noNaN: true });

  it('lies in [0, 1] whenever defined, and is never NaN (property)', () => {
    fc.assert(
      fc.property(order, u, order, u, (f, uf, p, up) => {
        const r = permanentSetShare(m(f, uf), m(p, up), { signsKnown: true });
        if (!r.defined) return;
        expect(r.share.value).toBeGreaterThanOrEqual(0);
        expect(r.share.value).toBeLessThanOrEqual(1);
        expect(Number.isFinite(r.share.uncertainty)).toBe(true);
      }),
    );
  });

  it('equals N_set/N_post when N_fab, N_set and N_post share one sign (property, [C])', () => {
    // p = f + s with f and s of one sign makes |f| + |s| = |p|, so the share is s/p.
    fc.assert(
      fc.property(fc.double({ min: 0.01, max: 5, noNaN: true }), fc.double({ min: 0.01, max: 5, noNaN: true }), fc.boolean(), (af, as, negative) => {
        const sign = negative ? -1 : 1;
        const f = sign * af;
        const p = f + sign * as;
        const r = permanentSetShare(m(f, 0.001), m(p, 0.001), { signsKnown: true });
        expect(r.defined).toBe(true);
        if (!r.defined) return;
        expect(r.share.value).toBeCloseTo((p - f) / p, 10);
      }),
    );
  });
});
