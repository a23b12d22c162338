import { describe, expect, it } from 'vitest';
import type { SourceRef } from '../../../src/annealing/AnnealingGuidance.ts';
import { appendRamp } from '../../../src/annealing/appendRamp.ts';
import type { PlanDraft } from '../../../src/annealing/PlanDraft.ts';
import type { ResolvedRate } from '../../../src/annealing/resolveRampRate.ts';
import { draftFor } from './support/draftFor.ts';

// Cast acrylic: α 0.109 mm²/s [R: reference sheet, property table], allowed gradient 2 °C (working value).
const acrylic = (thicknessMm: number, extra: Partial<PlanDraft> = {}) =>
  draftFor({ thicknessMm, diffusivityMm2PerS: 0.109, ...extra });
const S: SourceRef = { document: "A cast acrylic sheet maker's fabrication guidance", locator: 'cooling-rate table', flag: 'read' };
const rate = (rateCPerH: number, more: Partial<ResolvedRate> = {}): ResolvedRate => ({ rateCPerH, sources: [S], notes: [], warnings: [], ...more });

describe('appendRamp', () => {
  it('adds the 12 mm acrylic heat-up at the maker’s 14 °C/h with its slab check [R: maker’s table row 12–18 mm; C: R·L²/(2α)]', () => {
    const draft = acrylic(12);
    appendRamp(draft, { toC: 80, rate: rate(14), label: 'heat to soak' });
    const [segment] = draft.segments;
    expect(segment).toMatchObject({ number: 1, kind: 'ramp', startTemperatureC: 23, endTemperatureC: 80, rateCPerH: 14, startH: 0 });
    expect(segment!.durationH).toBeCloseTo(57 / 14, 12);
    // [C] lag = (14/3600 °C/s)·(6 mm)²/(2·0.109 mm²/s) = 0.6422 °C; limit 2α·2/36·3600 = 43.6 °C/h.
    const [check] = draft.rampChecks;
    expect(check!.lagC).toBeCloseTo(0.6422, 4);
    expect(check!.maxRateCPerH).toBeCloseTo(43.6, 9);
    expect(check!.withinAllowed).toBe(true);
    expect(draft.warnings).toEqual([]);
    expect(draft.temperatureC).toBe(80);
    expect(draft.elapsedH).toBeCloseTo(4.0714, 4);
    // Bi → ∞: the surface follows the oven, so the centre trails by the ramp lag alone.
    expect(draft.pendingLagC).toBeCloseTo(0.6422, 4);
    expect([...draft.sources.values()]).toEqual([S]);
  });

  it('adds nothing but a note when already at the target, though the rate’s sources are still recorded', () => {
    const draft = acrylic(6, { temperatureC: 80 });
    appendRamp(draft, { toC: 80, rate: rate(30, { notes: ['unused'] }), label: 'heat to soak' });
    expect(draft.segments).toEqual([]);
    expect(draft.rampChecks).toEqual([]);
    expect(draft.notes).toEqual(['heat to soak: already at 80 °C, no ramp needed.']);
    expect(draft.sources.size).toBe(1);
    expect(draft.elapsedH).toBe(0);
  });

  it('slows the 12 mm acrylic cool to meet the time rule t/4 = 3 h: 31 °C/3 h → 10.3 °C/h, rounded down [R: makers’ guidance; C]', () => {
    const draft = acrylic(12, { temperatureC: 80, elapsedH: 16.0714 });
    appendRamp(draft, { toC: 49, rate: rate(14), label: 'cool', minimumDurationH: 3 });
    const [segment] = draft.segments;
    expect(segment).toMatchObject({ kind: 'ramp', startTemperatureC: 80, endTemperatureC: 49, rateCPerH: 10.3, startH: 16.0714 });
    expect(segment!.durationH).toBeCloseTo(31 / 10.3, 12);
    expect(segment!.durationH).toBeGreaterThanOrEqual(3);
    expect(draft.notes).toEqual([
      'Segment 1 (cool): the time rule asks for at least 3 h, so 10.3 °C/h is used instead of 14 °C/h (the slower rule governs).',
    ]);
  });

  it('keeps the rate when the ramp lasts exactly the minimum time (31 °C at 10 °C/h = 3.1 h) [C]', () => {
    const draft = acrylic(12, { temperatureC: 80 });
    appendRamp(draft, { toC: 49, rate: rate(10), label: 'cool', minimumDurationH: 3.1 });
    expect(draft.segments[0]!.rateCPerH).toBe(10);
    expect(draft.notes).toEqual([]);
  });

  it('caps heating and cooling at the oven’s own limits, each in its own direction', () => {
    const limits = { maxHeatingRateCPerH: 20, maxCoolingRateCPerH: 25 };
    const draft = acrylic(3, { ovenLimits: limits });
    appendRamp(draft, { toC: 80, rate: rate(78), label: 'heat' });
    appendRamp(draft, { toC: 49, rate: rate(78), label: 'cool' });
    expect(draft.segments.map((s) => s.rateCPerH)).toEqual([20, 25]);
    expect(draft.segments.map((s) => s.number)).toEqual([1, 2]);
    expect(draft.segments[1]!.startH).toBeCloseTo(57 / 20, 12);
    expect(draft.notes).toEqual([
      "Segment 1 (heat): limited to the oven's 20 °C/h (planned 78 °C/h).",
      "Segment 2 (cool): limited to the oven's 25 °C/h (planned 78 °C/h).",
    ]);
  });

  it('keeps a rate below the oven’s slowest ramp but says how to step it: 0.5 °C/h on a 1 °C/h oven → 1 h ramp + 60 min hold per °C [C]', () => {
    const draft = acrylic(6, { temperatureC: 156, ovenLimits: { minRateCPerH: 1 } });
    appendRamp(draft, { toC: 140, rate: rate(0.5), label: 'cool' });
    expect(draft.segments[0]).toMatchObject({ rateCPerH: 0.5, durationH: 32 });
    expect(draft.warnings).toEqual([
      expect.objectContaining({
        kind: 'rate_below_oven_minimum',
        segmentNumber: 1,
        numbers: { rateCPerH: 0.5, ovenMinRateCPerH: 1, stepC: 1, stepRampH: 1, stepHoldH: 1 },
      }),
    ]);
    expect(draft.warnings[0]!.message).toContain('a hold of 60 min');
  });

  it('warns when the lag exceeds the allowed gradient, and proposes the rate that keeps it [C: 50 mm acrylic at 14 °C/h lags 11.149 °C; 2α·2/L²·3600 = 2.51 °C/h]', () => {
    const draft = acrylic(50);
    appendRamp(draft, { toC: 80, rate: rate(14), label: 'heat' });
    const check = draft.rampChecks[0]!;
    expect(check.lagC).toBeCloseTo(11.149, 3);
    expect(check.withinAllowed).toBe(false);
    expect(draft.warnings).toHaveLength(1);
    expect(draft.warnings[0]).toMatchObject({ kind: 'lag_exceeds_gradient', segmentNumber: 1 });
    expect(draft.warnings[0]!.numbers.proposedRateCPerH).toBeCloseTo(2.5114, 4);
    expect(draft.warnings[0]!.message).toContain('2.5 °C/h or slower');
  });

  it('does not warn at a rate set exactly at the gradient limit (43.6 °C/h for 12 mm acrylic) [C]', () => {
    const draft = acrylic(12);
    appendRamp(draft, { toC: 80, rate: rate(2 * 0.109 * 2 / 36 * 3600), label: 'heat' });
    expect(draft.rampChecks[0]!.withinAllowed).toBe(true);
    expect(draft.warnings).toEqual([]);
  });

  it('adds the surface’s own lag for a finite Biot number: ×(1 + 2/Bi), so Bi = 1 triples it [C: quasi-steady slab with convection]', () => {
    const draft = acrylic(12, { biot: 1 });
    appendRamp(draft, { toC: 80, rate: rate(14), label: 'heat' });
    expect(draft.pendingLagC).toBeCloseTo(3 * draft.rampChecks[0]!.lagC, 12);
  });

  it('never lets the centre trail by more than the ramp’s span plus what it already trailed [C]', () => {
    // 50 mm at 14 °C/h lags 11.149 °C quasi-steadily, but a 2 °C ramp cannot leave more than 2 °C (+0.5 already pending).
    const draft = acrylic(50, { temperatureC: 78, pendingLagC: 0.5 });
    appendRamp(draft, { toC: 80, rate: rate(14), label: 'heat' });
    expect(draft.pendingLagC).toBe(2.5);
  });

  it('carries the rate’s own notes and warnings, tagged with the segment number', () => {
    const draft = acrylic(60);
    appendRamp(draft, {
      toC: 80,
      rate: rate(3.5, {
        notes: ['extrapolated'],
        warnings: [{ kind: 'beyond_table', message: 'beyond the last row', numbers: { thicknessMm: 60 } }],
      }),
      label: 'heat',
    });
    expect(draft.notes[0]).toBe('Segment 1 (heat): extrapolated');
    expect(draft.warnings[0]).toEqual({ kind: 'beyond_table', segmentNumber: 1, message: 'beyond the last row', numbers: { thicknessMm: 60 } });
  });
});
