import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { assessFitnessToTest } from '../../../src/acceptance/assessFitnessToTest.ts';
import { COMMON_PRACTICE_FITNESS_CRITERIA } from '../../../src/acceptance/commonPracticeFitnessCriteria.ts';
import type { FitnessInput } from '../../../src/acceptance/FitnessTypes.ts';
import { DomainError } from '../../../src/errors/DomainError.ts';
import { monteCarlo } from '../uncertainty/support/monteCarlo.ts';

const m = (value: number, uncertainty: number) => ({ value, uncertainty });
const rank = { conforming: 0, undecided: 1, needs_annealing: 2 } as const;

const expectInvalid = (input: FitnessInput) => {
  try {
    assessFitnessToTest(input);
    expect.unreachable();
  } catch (e) {
    expect(e).toBeInstanceOf(DomainError);
    expect((e as DomainError).code).toBe('invalid_input');
  }
};

describe('assessFitnessToTest', () => {
  it('worked case: 0.12 ± 0.02 fringe, test order 6.0 ± 0.17 → conforming on both criteria [C]', () => {
    const r = assessFitnessToTest({
      residualOrder: m(0.12, 0.02),
      testFringeOrder: m(6.0, 0.17),
      criteria: { maxResidualFringeOrder: 0.2, maxResidualFractionOfTestOrder: 0.05 },
    });
    expect(r.decision).toBe('conforming');
    expect(r.coverageFactor).toBe(2);
    const [order, fraction] = r.criteria;
    expect(order).toMatchObject({ criterion: 'maxResidualFringeOrder', evaluated: true, limit: 0.2 });
    expect(fraction?.evaluated && fraction.judged.value).toBeCloseTo(0.02, 12);
    // u = √((0.02/6)² + (0.02·0.17/6)²)
    expect(fraction?.evaluated && fraction.judged.uncertainty).toBeCloseTo(Math.hypot(0.02 / 6, (0.02 * 0.17) / 6), 12);
  });

  it('fraction uncertainty agrees with a repeatable Monte Carlo within 2 % [M: GUM Supplement 1 method]', () => {
    const r = assessFitnessToTest({ residualOrder: m(0.3, 0.02), testFringeOrder: m(6.0, 0.17), criteria: { maxResidualFractionOfTestOrder: 0.1 } });
    const mc = monteCarlo([m(0.3, 0.02), m(6.0, 0.17)], (a, b) => a / b);
    const c = r.criteria[0];
    expect(c?.evaluated).toBe(true);
    if (!c?.evaluated) return;
    expect(Math.abs(mc.uncertainty / c.judged.uncertainty - 1)).toBeLessThan(0.02);
  });

  it('needs annealing when a residual is proven above its limit (ISO 14253-1 decision rules, [M])', () => {
    const r = assessFitnessToTest({ residualOrder: m(0.3, 0.02), criteria: { maxResidualFringeOrder: 0.2 } });
    expect(r.decision).toBe('needs_annealing');
    expect(r.criteria[0]?.evaluated && r.criteria[0].guardBand.decision).toBe('not_conforming');
  });

  it('is undecided when the expanded interval straddles the limit', () => {
    expect(assessFitnessToTest({ residualOrder: m(0.18, 0.02), criteria: { maxResidualFringeOrder: 0.2 } }).decision).toBe('undecided');
  });

  it('judges the magnitude of a compressive (negative) residual', () => {
    const r = assessFitnessToTest({ residualOrder: m(-0.3, 0.02), residualStressMPa: m(-0.35, 0.03), criteria: { maxResidualFringeOrder: 0.2, maxResidualStressMPa: 1 } });
    expect(r.decision).toBe('needs_annealing');
    expect(r.criteria[1]).toMatchObject({ criterion: 'maxResidualStressMPa', evaluated: true, judged: { value: 0.35 } });
  });

  it('worst criterion wins: one not conforming beats conforming and undecided', () => {
    const r = assessFitnessToTest({
      residualOrder: m(0.18, 0.02),
      residualStressMPa: m(0.21, 0.02),
      testFringeOrder: m(2.0, 0.05),
      criteria: { maxResidualFringeOrder: 0.2, maxResidualStressMPa: 0.5, maxResidualFractionOfTestOrder: 0.05 },
    });
    expect(r.criteria.map((c) => c.evaluated && c.guardBand.decision)).toEqual(['undecided', 'conforming', 'not_conforming']);
    expect(r.decision).toBe('needs_annealing');
  });

  it('is undecided, with a reason, when the test order cannot be told from zero', () => {
    const r = assessFitnessToTest({ residualOrder: m(0.05, 0.01), testFringeOrder: m(0.1, 0.1), criteria: { maxResidualFractionOfTestOrder: 0.1 } });
    expect(r.decision).toBe('undecided');
    expect(r.criteria[0]).toMatchObject({ evaluated: false, decision: 'undecided', reason: expect.stringContaining('test fringe order') });
  });

  it('uses the common-practice defaults, flagged as recalled practice', () => {
    expect(COMMON_PRACTICE_FITNESS_CRITERIA.flag).toBe('[M] common practice: below about 0.1–0.2 fringe, or 5–10 % of the largest test order');
    const r = assessFitnessToTest({ residualOrder: m(0.08, 0.01), testFringeOrder: m(6, 0.2), criteria: COMMON_PRACTICE_FITNESS_CRITERIA.usual });
    expect(r.decision).toBe('conforming');
    const strict = assessFitnessToTest({ residualOrder: m(0.15, 0.01), testFringeOrder: m(6, 0.2), criteria: COMMON_PRACTICE_FITNESS_CRITERIA.strict });
    expect(strict.decision).toBe('needs_annealing');
  });

  it('refuses no criteria, a missing input a criterion needs, and a non-positive limit', () => {
    expectInvalid({ residualOrder: m(0.1, 0.01), criteria: {} });
    expectInvalid({ residualOrder: m(0.1, 0.01), criteria: { maxResidualStressMPa: 1 } });
    expectInvalid({ residualOrder: m(0.1, 0.01), criteria: { maxResidualFractionOfTestOrder: 0.05 } });
    expectInvalid({ residualOrder: m(0.1, 0.01), criteria: { maxResidualFringeOrder: 0 } });
  });

  it('a larger residual never gets a better decision (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: 0, max: 0.05, noNaN: true }), (a, b, u) => {
        const [lo, hi] = a <= b ? [a, b] : [b, a];
        const judge = (v: number) =>
          assessFitnessToTest({ residualOrder: m(v, u), testFringeOrder: m(4, 0.1), criteria: { maxResidualFringeOrder: 0.2, maxResidualFractionOfTestOrder: 0.05 } }).decision;
        expect(rank[judge(hi)]).toBeGreaterThanOrEqual(rank[judge(lo)]);
      }),
    );
  });
});
