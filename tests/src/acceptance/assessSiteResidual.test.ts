import { describe, expect, it } from 'vitest';
import { assessSiteResidual, type SiteResidualInput } from '../../../src/acceptance/assessSiteResidual.ts';
import type { RecordedReading } from '../../../src/residual/stageInputsFromReadings.ts';

const day = (d: number) => new Date(Date.UTC(2026, 10, d));
const r = (id: string, stage: RecordedReading['stage'], d: number, order: number, loadN: number | null = null): RecordedReading => ({
  id, stage, observedAt: day(d), fringeOrder: order, fringeOrderUncertainty: 0.02, wavelengthNm: 577, sign: 'unknown', loadN,
});

const base: SiteResidualInput = {
  readings: [r('fab', 'before_load', 1, 0.1), r('load', 'under_load', 2, 7.0, 600), r('post', 'after_unload', 3, 0.15)],
  fringeValueNPerMm: { value: 7.0, uncertainty: 0.5 },
  referenceWavelengthNm: 577,
  thicknessMm: { value: 6, uncertainty: 0.02 },
  onFreeEdge: true,
  geometry: { geometryKind: 'opposite_rounded_notches', grossWidthMm: 40, netWidthMm: 24, notchDepthMm: 8, notchRootRadiusMm: 4 },
  criteria: { maxResidualFringeOrder: 0.2, maxResidualFractionOfTestOrder: 0.1 },
  coverageFactor: 2,
  plannedLoadN: 600,
};

describe('assessSiteResidual', () => {
  it('judges the latest unloaded reading and measures Kt from the load-corrected order [C: hand computation]', () => {
    const out = assessSiteResidual(base);
    expect(out.current?.readingId).toBe('post');
    // σ = N·fσ/t = 0.15·7/6 = 0.175 MPa at the free edge
    expect(out.current?.stress.stressMPa.value).toBeCloseTo(0.175, 10);
    // Kt = (N_load − N_fab)·fσ·w_net/P = 6.9·7·24/600 = 1.932
    expect(out.stressConcentration.measured).toMatchObject({ defined: true, kt: { value: expect.closeTo(1.932, 9) } });
    // the planned test at the same load reproduces the measured load-corrected order, 6.9 fringes
    expect(out.testFringeOrder?.ktSource).toBe('measured');
    expect(out.testFringeOrder?.testFringeOrder.value).toBeCloseTo(6.9, 9);
    // 0.15 + 2·0.02 = 0.19 ≤ 0.2, and 0.15/6.9 = 0.0217 ≤ 0.1
    expect(out.decision).toBe('conforming');
    expect(out.stressConcentration.handbook.available).toBe(true);
  });

  it('needs annealing when the residual is beyond the limit by more than the guard band', () => {
    const out = assessSiteResidual({ ...base, readings: [r('fab', 'before_load', 1, 0.55)] });
    expect(out.decision).toBe('needs_annealing');
  });

  it('is undecided inside the guard band (ISO 14253-1 manner, [M])', () => {
    const out = assessSiteResidual({ ...base, readings: [r('fab', 'before_load', 1, 0.19)] });
    expect(out.decision).toBe('undecided');
  });

  it('drops the fraction limit with a note when no Kt or planned load is at hand', () => {
    const out = assessSiteResidual({ ...base, plannedLoadN: null, readings: [r('fab', 'before_load', 1, 0.05)] });
    expect(out.notes.join(' ')).toMatch(/fraction-of-test-order limit not judged/);
    expect(out.fitness?.criteria.map((c) => c.criterion)).toEqual(['maxResidualFringeOrder']);
  });

  it('says when a site has no reading yet', () => {
    expect(assessSiteResidual({ ...base, readings: [] }).decision).toBe('no_readings');
  });
});
