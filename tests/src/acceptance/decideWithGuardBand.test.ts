import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { decideWithGuardBand } from '../../../src/acceptance/decideWithGuardBand.ts';
import type { GuardBandDecision } from '../../../src/acceptance/decideWithGuardBand.ts';
import { DomainError } from '../../../src/errors/DomainError.ts';

// ISO 14253-1 decision rules, [M] (from memory): against an upper limit, conformance is
// proven only when the whole interval y ± U lies at or below the limit, non-conformance
// only when it lies wholly above; otherwise neither is proven.
const isoRule = (value: number, u: number, k: number, limit: number): GuardBandDecision => {
  const lower = value - k * u;
  const upper = value + k * u;
  if (upper <= limit) return 'conforming';
  if (lower > limit) return 'not_conforming';
  return 'undecided';
};
const rank: Record<GuardBandDecision, number> = { conforming: 0, undecided: 1, not_conforming: 2 };

describe('decideWithGuardBand', () => {
  it('worked case: 0.12 ± 0.02 fringe against 0.2 → conforming, zone bounds 0.16 and 0.24 [C]', () => {
    const r = decideWithGuardBand({ value: 0.12, uncertainty: 0.02 }, 0.2);
    expect(r.decision).toBe('conforming');
    expect(r.coverageFactor).toBe(2);
    expect(r.expandedUncertainty).toBeCloseTo(0.04, 12);
    expect(r.acceptanceZoneUpperBound).toBeCloseTo(0.16, 12);
    expect(r.rejectionZoneLowerBound).toBeCloseTo(0.24, 12);
  });

  it.each([
    [0.18, 0.02, 2, 0.2, 'undecided'],
    [0.22, 0.02, 2, 0.2, 'undecided'],
    [0.3, 0.02, 2, 0.2, 'not_conforming'],
    [0.18, 0.02, 1, 0.2, 'conforming'],
    [0.2, 0, 2, 0.2, 'conforming'],
    [0.2000001, 0, 2, 0.2, 'not_conforming'],
  ] as const)('value %d, u %d, k %d, limit %d → %s (ISO 14253-1 decision rules, [M])', (value, u, k, limit, expected) => {
    expect(decideWithGuardBand({ value, uncertainty: u }, limit, k).decision).toBe(expected);
  });

  it('edges of the zones with exact binary numbers: y + U = limit conforms, y − U = limit does not reject', () => {
    expect(decideWithGuardBand({ value: 0.125, uncertainty: 0.0625 }, 0.25).decision).toBe('conforming');
    expect(decideWithGuardBand({ value: 0.375, uncertainty: 0.0625 }, 0.25).decision).toBe('undecided');
  });

  const finite = fc.double({ min: -100, max: 100, noNaN: true });
  const u = fc.double({ min: 0, max: 10, noNaN: true });
  const k = fc.double({ min: 0.5, max: 4, noNaN: true });

  it('agrees with the ISO 14253-1 rule stated on the interval y ± k·u (property)', () => {
    fc.assert(
      fc.property(finite, u, k, finite, (value, uu, kk, limit) => {
        expect(decideWithGuardBand({ value, uncertainty: uu }, limit, kk).decision).toBe(isoRule(value, uu, kk, limit));
      }),
    );
  });

  it('is monotone in the value: a larger value never gets a better decision (property)', () => {
    fc.assert(
      fc.property(finite, finite, u, k, finite, (a, b, uu, kk, limit) => {
        const [lo, hi] = a <= b ? [a, b] : [b, a];
        const dLo = decideWithGuardBand({ value: lo, uncertainty: uu }, limit, kk).decision;
        const dHi = decideWithGuardBand({ value: hi, uncertainty: uu }, limit, kk).decision;
        expect(rank[dHi]).toBeGreaterThanOrEqual(rank[dLo]);
      }),
    );
  });

  it('a wider guard band never turns undecided into a firm decision (property)', () => {
    fc.assert(
      fc.property(finite, u, k, finite, (value, uu, kk, limit) => {
        const narrow = decideWithGuardBand({ value, uncertainty: uu }, limit, kk).decision;
        const wide = decideWithGuardBand({ value, uncertainty: uu }, limit, kk * 1.5).decision;
        if (narrow === 'undecided') expect(wide).toBe('undecided');
      }),
    );
  });

  it.each([
    [{ value: 0.1, uncertainty: 0.01 }, Number.NaN, 2],
    [{ value: 0.1, uncertainty: 0.01 }, 0.2, 0],
    [{ value: 0.1, uncertainty: -0.01 }, 0.2, 2],
  ])('refuses bad input with invalid_input', (m, limit, kk) => {
    expect(() => decideWithGuardBand(m, limit, kk)).toThrow(DomainError);
  });
});
