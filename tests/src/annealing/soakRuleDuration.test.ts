import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { SoakTimeRule, SourceRef } from '../../../src/annealing/AnnealingGuidance.ts';
import { CAST_ACRYLIC_GUIDANCE } from '../../../src/annealing/castAcrylicGuidance.ts';
import { CAST_EPOXY_GUIDANCE } from '../../../src/annealing/castEpoxyGuidance.ts';
import { POLYCARBONATE_ZAKERI_2013 } from '../../../src/annealing/polycarbonateGuidance.ts';
import { soakRuleDuration } from '../../../src/annealing/soakRuleDuration.ts';

const S = (locator: string): SourceRef => ({ document: 'Invented rule', locator, flag: 'common_practice' });

describe('soakRuleDuration', () => {
  // Makers' rule [R: cast acrylic makers' fabrication guidance]: hold 1 h per mm of thickness, at least 2 h.
  it.each([
    [0.5, 2],
    [1, 2],
    [2, 2], // both terms equal
    [3, 3],
    [12, 12],
    [25, 25],
  ])('cast acrylic, %s mm: max(2 h, 1 h/mm × t) = %s h [R: makers’ guidance]', (thicknessMm, hours) => {
    const r = soakRuleDuration(CAST_ACRYLIC_GUIDANCE.soak.time, thicknessMm);
    expect(r.durationH).toBe(hours);
    expect(r.maximumH).toBeNull();
    expect(r.sources.map((s) => s.flag)).toEqual(['read', 'read']);
  });

  it('gives a fixed hold regardless of thickness when there is no per-mm term: the 3 h hold at 100 °C [R: Zakeri 2013]', () => {
    const hold = POLYCARBONATE_ZAKERI_2013.heating[0]!.hold!;
    for (const t of [1, 6, 40]) expect(soakRuleDuration(hold, t)).toEqual({ durationH: 3, maximumH: null, sources: [hold.minimumH.source] });
  });

  it('gives zero where the published cycle states no hold at the top temperature [R: Zakeri 2013]', () => {
    expect(soakRuleDuration(POLYCARBONATE_ZAKERI_2013.soak.time, 6).durationH).toBe(0);
  });

  it('reports the practice band’s upper end without enforcing it: cast epoxy 1–4 h [M: handbook practice, from memory]', () => {
    const r = soakRuleDuration(CAST_EPOXY_GUIDANCE.soak.time, 20);
    expect(r).toEqual({ durationH: 1, maximumH: 4, sources: [CAST_EPOXY_GUIDANCE.soak.time.minimumH.source, CAST_EPOXY_GUIDANCE.soak.time.maximumH!.source] });
    const beyond: SoakTimeRule = { ...CAST_EPOXY_GUIDANCE.soak.time, hoursPerMm: { value: 0.25, source: S('per mm') } };
    // [C] 0.25 h/mm × 20 mm = 5 h, above the band's 4 h: returned as is, the plan warns.
    expect(soakRuleDuration(beyond, 20)).toMatchObject({ durationH: 5, maximumH: 4 });
  });

  it('lists sources as minimum, per-mm term, band maximum', () => {
    const rule: SoakTimeRule = { minimumH: { value: 1, source: S('min') }, hoursPerMm: { value: 0.5, source: S('per mm') }, maximumH: { value: 8, source: S('max') } };
    expect(soakRuleDuration(rule, 4).sources.map((s) => s.locator)).toEqual(['min', 'per mm', 'max']);
  });

  it('is the larger of the minimum and the per-mm time, never below either (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 24, noNaN: true }),
        fc.double({ min: 0, max: 3, noNaN: true }),
        fc.double({ min: 0.1, max: 500, noNaN: true }),
        (minimumH, hoursPerMm, thicknessMm) => {
          const r = soakRuleDuration({ minimumH: { value: minimumH, source: S('min') }, hoursPerMm: { value: hoursPerMm, source: S('per mm') } }, thicknessMm);
          expect(r.durationH).toBeGreaterThanOrEqual(minimumH);
          expect(r.durationH).toBeGreaterThanOrEqual(hoursPerMm * thicknessMm);
          expect([minimumH, hoursPerMm * thicknessMm]).toContain(r.durationH);
        },
      ),
    );
  });
});
