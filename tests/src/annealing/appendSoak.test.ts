import { describe, expect, it } from 'vitest';
import type { SourceRef } from '../../../src/annealing/AnnealingGuidance.ts';
import { appendSoak } from '../../../src/annealing/appendSoak.ts';
import type { PlanDraft } from '../../../src/annealing/PlanDraft.ts';
import { draftFor } from './support/draftFor.ts';

const S: SourceRef = { document: 'Invented rule', locator: 'soak', flag: 'common_practice' };
const rule = (durationH: number, maximumH: number | null = null) => ({ durationH, maximumH, sources: [S] });
// Polycarbonate section 20 mm (L = 10 mm), α 0.144 mm²/s [R: reference sheet, property table].
const pc = (extra: Partial<PlanDraft> = {}) =>
  draftFor({ thicknessMm: 20, diffusivityMm2PerS: 0.144, temperatureC: 140, elapsedH: 5, ...extra });

describe('appendSoak', () => {
  it('uses the rule’s time when the centre already lies within tolerance, and clears the pending lag', () => {
    const draft = pc({ pendingLagC: 0.6 });
    appendSoak(draft, { rule: rule(3), label: 'soak' });
    expect(draft.segments).toEqual([
      { number: 1, kind: 'soak', label: 'soak', startTemperatureC: 140, endTemperatureC: 140, rateCPerH: null, durationH: 3, startH: 5 },
    ]);
    expect(draft.soakChecks[0]).toMatchObject({ segmentNumber: 1, ruleDurationH: 3, equilibrationH: 0, durationH: 3, lengthenedBecause: null });
    expect(draft.elapsedH).toBe(8);
    expect(draft.pendingLagC).toBe(0);
    expect([...draft.sources.values()]).toEqual([S]);
  });

  it('lengthens a soak to the equilibration time: 10 °C to within 1 °C, Bi → ∞, takes Fo 1.031 = 0.1989 h [C: ln(1.2732·10)/1.5708²; ζ1, C1 of Incropera Table 5.1]', () => {
    const draft = pc({ pendingLagC: 10 });
    appendSoak(draft, { rule: rule(0.1), label: 'soak' });
    const check = draft.soakChecks[0]!;
    expect(check.fourier).toBeCloseTo(Math.log(1.2732 * 10) / 1.5708 ** 2, 3);
    expect(check.durationH).toBeCloseTo((1.0311 * 100) / 0.144 / 3600, 3);
    expect(check.oneTermValid).toBe(true);
    expect(draft.segments[0]!.durationH).toBe(check.equilibrationH);
    expect(check.lengthenedBecause).toMatch(/^The centre starts 10\.00 °C behind and needs about 0\.20 h \(one-term slab solution, Fo 1\.03\) to come within 1 °C, longer than the rule's 0\.1 h\.$/);
    expect(draft.notes).toEqual([`Segment 1 (soak) lengthened: ${check.lengthenedBecause}`]);
  });

  it('takes longer with a finite surface coefficient: Bi 1, ζ1 0.8603, C1 1.1191 → Fo 3.263, 0.629 h [R: Incropera Table 5.1 values in REFERENCES; C]', () => {
    const draft = pc({ pendingLagC: 10, biot: 1 });
    appendSoak(draft, { rule: rule(0), label: 'soak' });
    const fourier = Math.log(1.1191 * 10) / 0.8603 ** 2;
    expect(draft.soakChecks[0]!.fourier).toBeCloseTo(fourier, 3);
    expect(draft.segments[0]!.durationH).toBeCloseTo((fourier * 100) / 0.144 / 3600, 3);
  });

  it('marks a short inversion (Fo below 0.2) as an upper bound: 1.1 °C to within 1 °C gives Fo 0.137 [C]', () => {
    const draft = pc({ pendingLagC: 1.1 });
    appendSoak(draft, { rule: rule(0), label: 'soak' });
    const check = draft.soakChecks[0]!;
    expect(check.fourier).toBeCloseTo(Math.log(1.2732 * 1.1) / 1.5708 ** 2, 3);
    expect(check.oneTermValid).toBe(false);
    expect(check.lengthenedBecause).toContain('below 0.2: an upper bound');
  });

  it('adds no segment for a zero-length hold when the centre is within tolerance, but still checks it (the top of the published cycle) [R: Zakeri 2013 lists no hold at 156 °C]', () => {
    const draft = pc({ temperatureC: 156, pendingLagC: 0.2 });
    appendSoak(draft, { rule: rule(0), label: 'soak at 156 °C' });
    expect(draft.segments).toEqual([]);
    expect(draft.soakChecks).toEqual([expect.objectContaining({ segmentNumber: null, temperatureC: 156, durationH: 0, initialDifferenceC: 0.2 })]);
    expect(draft.notes).toEqual(['soak at 156 °C: the guidance gives no hold here and the centre is already within 1 °C, so no soak segment is added.']);
    expect(draft.elapsedH).toBe(5);
    expect(draft.pendingLagC).toBe(0);
  });

  it('numbers the soak after the segments already there', () => {
    const draft = pc({ segments: [{ number: 1, kind: 'ramp', label: 'heat', startTemperatureC: 23, endTemperatureC: 140, rateCPerH: 23.4, durationH: 5, startH: 0 }] });
    appendSoak(draft, { rule: rule(2), label: 'soak' });
    expect(draft.segments.map((s) => [s.number, s.kind, s.startH])).toEqual([[1, 'ramp', 0], [2, 'soak', 5]]);
  });

  it('warns beyond the practice band’s upper end, not at it: epoxy band 1–4 h [M: handbook practice, from memory]', () => {
    const atLimit = pc();
    appendSoak(atLimit, { rule: rule(4, 4), label: 'soak' });
    expect(atLimit.warnings).toEqual([]);
    // [C] a 60 mm section (L 30 mm) 10 °C behind needs Fo 1.031·900/0.144 s = 1.79 h, past a 1 h band.
    const beyond = pc({ thicknessMm: 60, halfThicknessMm: 30, pendingLagC: 10 });
    appendSoak(beyond, { rule: rule(1, 1), label: 'soak' });
    const durationH = beyond.segments[0]!.durationH;
    expect(durationH).toBeCloseTo((1.0311 * 900) / 0.144 / 3600, 3);
    expect(beyond.warnings).toEqual([
      { kind: 'soak_beyond_practice_band', segmentNumber: 1, message: `The soak needs ${durationH.toFixed(2)} h, beyond the practice band's 1 h.`, numbers: { durationH, maximumH: 1 } },
    ]);
  });
});
