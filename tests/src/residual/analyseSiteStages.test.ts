import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { analyseSiteStages } from '../../../src/residual/analyseSiteStages.ts';
import type { SiteStagesInput } from '../../../src/residual/SiteStagesTypes.ts';
import { DomainError } from '../../../src/errors/DomainError.ts';
import { monteCarlo } from '../uncertainty/support/monteCarlo.ts';

const m = (value: number, uncertainty: number) => ({ value, uncertainty });
const optics = { fringeValueNPerMm: m(7.0, 0.2), thicknessMm: m(6.0, 0.05) };

// Invented notch-root history of a 6 mm polycarbonate-like strip (fσ 7.0 N/mm per fringe).
const signedHistory: SiteStagesInput = {
  fabrication: { order: m(0.3, 0.02), signKnown: true },
  underLoad: { order: m(2.4, 0.02), signKnown: true, loadN: 400 },
  afterUnload: { order: m(0.45, 0.02), signKnown: true },
  ...optics,
  onFreeEdge: true,
};

describe('analyseSiteStages', () => {
  it('worked case at a free edge, all signs measured [C, hand-computed]', () => {
    const r = analyseSiteStages(signedHistory);
    expect(r.coverageFactor).toBe(2);
    expect(r.stressKind).toBe('edge_stress');
    expect(r.fabricationResidual?.order).toEqual(m(0.3, 0.02));
    expect(r.fabricationResidual?.stress.stressMPa.value).toBeCloseTo(0.35, 12); // 0.3·7/6
    expect(r.loadCorrected?.order.value).toBeCloseTo(2.1, 12);
    expect(r.loadCorrected?.order.uncertainty).toBeCloseTo(0.02 * Math.SQRT2, 12);
    expect(r.loadCorrected?.stress.stressMPa.value).toBeCloseTo(2.45, 12); // 2.1·7/6
    // u² = (7/6·0.028284)² + (2.1/6·0.2)² + (2.45/6·0.05)²
    expect(r.loadCorrected?.stress.stressMPa.uncertainty).toBeCloseTo(Math.hypot((7 / 6) * 0.028284271, 0.07, (2.45 / 6) * 0.05), 6);
    expect(r.loadCorrected?.validity).toBe('valid_at_free_boundary');
    expect(r.loadCorrected?.loadN).toBe(400);
    expect(r.permanentSet?.order.value).toBeCloseTo(0.15, 12);
    expect(r.permanentSet?.stress.stressMPa.value).toBeCloseTo(0.175, 12);
    expect(r.permanentSetShare?.defined && r.permanentSetShare.share.value).toBeCloseTo(1 / 3, 12);
    // 0.15/2.1
    expect(r.inelasticFractionOfPeak?.defined && r.inelasticFractionOfPeak.ratio.value).toBeCloseTo(0.0714286, 6);
    expect(r.fabricationResidual?.signNote).toBeUndefined();
    expect(r.annealRelief).toBeUndefined();
  });

  it('inelastic fraction uncertainty through the whole analysis matches a repeatable Monte Carlo within 3 %', () => {
    const r = analyseSiteStages(signedHistory);
    const mc = monteCarlo([m(0.3, 0.02), m(2.4, 0.02), m(0.45, 0.02)], (f, l, p) => (p - f) / (l - f));
    expect(r.inelasticFractionOfPeak?.defined).toBe(true);
    if (!r.inelasticFractionOfPeak?.defined) return;
    expect(Math.abs(mc.uncertainty / r.inelasticFractionOfPeak.ratio.uncertainty - 1)).toBeLessThan(0.03);
  });

  it('anneal relief worked case: (0.40 − 0.05)/0.40 = 0.875 ± 0.0504 [C]; matches Monte Carlo within 3 %', () => {
    const r = analyseSiteStages({
      beforeAnneal: { order: m(0.4, 0.02), signKnown: true },
      afterAnneal: { order: m(0.05, 0.02), signKnown: true },
      ...optics,
      onFreeEdge: true,
    });
    expect(r.annealRelief?.defined).toBe(true);
    if (!r.annealRelief?.defined) return;
    expect(r.annealRelief.ratio.value).toBeCloseTo(0.875, 12);
    expect(r.annealRelief.ratio.uncertainty).toBeCloseTo(0.02 * Math.hypot(1 / 0.4, 0.05 / 0.16), 10);
    const mc = monteCarlo([m(0.4, 0.02), m(0.05, 0.02)], (pre, post) => (pre - post) / pre);
    expect(Math.abs(mc.uncertainty / r.annealRelief.ratio.uncertainty - 1)).toBeLessThan(0.03);
    expect(r.stages.beforeAnneal?.stress.stressMPa.value).toBeCloseTo((0.4 * 7) / 6, 12);
  });

  it('reports undefined anneal relief, not NaN, when the pre-anneal order is within 2·u of zero', () => {
    const r = analyseSiteStages({
      beforeAnneal: { order: m(0.03, 0.02), signKnown: false },
      afterAnneal: { order: m(0.01, 0.02), signKnown: false },
      ...optics,
      onFreeEdge: true,
    });
    expect(r.annealRelief).toMatchObject({ defined: false, stagesWithAssumedSign: ['beforeAnneal', 'afterAnneal'] });
  });

  it('away from a free edge: principal stress difference, load correction valid only if directions agree', () => {
    const r = analyseSiteStages({ ...signedHistory, onFreeEdge: false });
    expect(r.stressKind).toBe('principal_stress_difference');
    expect(r.loadCorrected?.stress.kind).toBe('principal_stress_difference');
    expect(r.loadCorrected?.validity).toBe('valid_only_if_principal_directions_agree');
    expect(r.loadCorrected?.validityNote).toContain('principal directions agree');
  });

  it('unsigned readings: taken as positive, said so, and a fall after loading is flagged', () => {
    const r = analyseSiteStages({
      fabrication: { order: m(0.5, 0.01), signKnown: false },
      afterUnload: { order: m(0.35, 0.01), signKnown: false },
      ...optics,
      onFreeEdge: true,
    });
    expect(r.permanentSet?.order.value).toBeCloseTo(-0.15, 12);
    expect(r.permanentSet?.stagesWithAssumedSign).toEqual(['afterUnload', 'fabrication']);
    expect(r.permanentSet?.signNote).toContain('taken as positive');
    expect(r.permanentSetShare?.possibleRelaxationOrSignReversal).toBe(true);
    expect(r.permanentSetShare?.signNote).toContain('fabrication');
    expect(r.permanentSetShare?.defined && r.permanentSetShare.share.value).toBeCloseTo(0.15 / 0.65, 12);
  });

  it('mixed signs: only the unsigned stage is named in the note', () => {
    const r = analyseSiteStages({
      fabrication: { order: m(0.3, 0.02), signKnown: true },
      afterUnload: { order: m(0.2, 0.02), signKnown: false },
      ...optics,
      onFreeEdge: true,
    });
    expect(r.permanentSet?.stagesWithAssumedSign).toEqual(['afterUnload']);
    expect(r.fabricationResidual?.stagesWithAssumedSign).toEqual([]);
    expect(r.permanentSetShare?.possibleRelaxationOrSignReversal).toBe(true);
  });

  it('notes what it could not compute for lack of a fabrication reading', () => {
    const r = analyseSiteStages({ underLoad: { order: m(2.4, 0.02), signKnown: true, loadN: 400 }, ...optics, onFreeEdge: true });
    expect(r.loadCorrected).toBeUndefined();
    expect(r.notes.join(' ')).toContain('needs a fabrication reading');
  });

  it.each([
    ['no stage', { ...optics, onFreeEdge: true }],
    ['negative unsigned order', { fabrication: { order: m(-0.2, 0.01), signKnown: false }, ...optics, onFreeEdge: true }],
    ['zero thickness', { fabrication: { order: m(0.2, 0.01), signKnown: true }, fringeValueNPerMm: m(7, 0.2), thicknessMm: m(0, 0), onFreeEdge: true }],
    ['non-positive load', { ...signedHistory, underLoad: { order: m(2.4, 0.02), signKnown: true, loadN: 0 } }],
  ])('refuses %s with invalid_input', (_label, input) => {
    try {
      analyseSiteStages(input as SiteStagesInput);
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(DomainError);
      expect((e as DomainError).code).toBe('invalid_input');
    }
  });

  it('never puts NaN or Infinity in its output (property)', () => {
    const reading = fc.record({ order: fc.record({ value: fc.double({ min: 0, max: 5, noNaN: true }), uncertainty: fc.double({ min: 0, max: 0.3, noNaN: true }) }), signKnown: fc.boolean() });
    fc.assert(
      fc.property(reading, reading, reading, reading, reading, fc.boolean(), (fab, load, post, pre, ann, edge) => {
        const r = analyseSiteStages({ fabrication: fab, underLoad: { ...load, loadN: 100 }, afterUnload: post, beforeAnneal: pre, afterAnneal: ann, ...optics, onFreeEdge: edge });
        JSON.stringify(r, (_k, v: unknown) => {
          if (typeof v === 'number') expect(Number.isFinite(v)).toBe(true);
          return v;
        });
        if (r.permanentSetShare?.defined) {
          expect(r.permanentSetShare.share.value).toBeGreaterThanOrEqual(0);
          expect(r.permanentSetShare.share.value).toBeLessThanOrEqual(1);
        }
      }),
    );
  });
});
