import { describe, expect, it } from 'vitest';
import { DomainError } from '../../../src/errors/DomainError.ts';
import { CAST_ACRYLIC_GUIDANCE } from '../../../src/annealing/castAcrylicGuidance.ts';
import { CAST_EPOXY_GUIDANCE } from '../../../src/annealing/castEpoxyGuidance.ts';
import { generateAnnealingPlan } from '../../../src/annealing/generateAnnealingPlan.ts';
import { ANNEALING_CAUTIONS, ANNEALING_GUIDANCE_CATALOGUE } from '../../../src/annealing/guidanceCatalogue.ts';
import { maxRateForAllowedLag } from '../../../src/annealing/maxRateForAllowedLag.ts';
import { POLYCARBONATE_ZAKERI_2013 } from '../../../src/annealing/polycarbonateGuidance.ts';
import { rampLagC } from '../../../src/annealing/rampLagC.ts';
import { SODA_LIME_GLASS_GUIDANCE } from '../../../src/annealing/sodaLimeGlassGuidance.ts';
import { timeForCentreWithinTolerance } from '../../../src/annealing/timeForCentreWithinTolerance.ts';

const summary = (p: ReturnType<typeof generateAnnealingPlan>) =>
  p.segments.map((s) => [s.kind, s.startTemperatureC, s.endTemperatureC, s.rateCPerH, Number(s.durationH.toFixed(4))]);

describe('generateAnnealingPlan: cast acrylic against the makers’ fabrication guidance [R]', () => {
  // Makers' rule [R]: soak at 80 °C for max(2 h, 1 h per mm); cool per the maker's table (°C/h,
  // converted from °F/h) to 49 °C; above 8 mm the cooling time is at least thickness/4 h.
  it.each([
    [2, 78, 2],
    [3, 78, 3],
    [6, 30, 6],
  ])('%s mm: soak %s °C/h table row, soak max(2, t) h', (t, tableRate, soakH) => {
    const plan = generateAnnealingPlan({ guidance: CAST_ACRYLIC_GUIDANCE, maxSectionThicknessMm: t });
    expect(summary(plan)).toEqual([
      ['ramp', 23, 80, tableRate, Number((57 / tableRate).toFixed(4))],
      ['soak', 80, 80, null, soakH],
      ['ramp', 80, 49, tableRate, Number((31 / tableRate).toFixed(4))],
    ]);
    expect(plan.warnings).toEqual([]);
  });

  it.each([
    [12, 14],
    [25, 6.7], // between the 24 mm and 38–44 mm rows: the slower row
  ])('%s mm: soak t h, cooling no faster than the table (%s °C/h) and lasting at least t/4 h', (t, tableRate) => {
    const plan = generateAnnealingPlan({ guidance: CAST_ACRYLIC_GUIDANCE, maxSectionThicknessMm: t });
    const [heat, soak, cool] = plan.segments;
    expect(heat?.rateCPerH).toBe(tableRate);
    expect(soak?.durationH).toBe(t);
    expect(cool?.rateCPerH).toBeLessThanOrEqual(tableRate);
    // The time rule governs at these thicknesses: 31 °C over t/4 h, rounded down to 0.1 °C/h.
    expect(cool?.rateCPerH).toBe(Math.floor((31 / (t / 4)) * 10) / 10);
    expect(cool!.durationH).toBeGreaterThanOrEqual(t / 4);
    expect(cool!.durationH).toBeLessThan(t / 4 + 0.1);
    expect(plan.notes.some((n) => n.includes('the slower rule governs'))).toBe(true);
  });

  it('cites the makers’ guidance and the property table, and carries the cautions', () => {
    const plan = generateAnnealingPlan({ guidance: CAST_ACRYLIC_GUIDANCE, maxSectionThicknessMm: 6, catalogueVersion: ANNEALING_GUIDANCE_CATALOGUE.version });
    expect(plan.sources.map((s) => s.document)).toEqual(
      expect.arrayContaining(["Cast acrylic sheet makers' fabrication guidance", "A cast acrylic sheet maker's fabrication guidance"]),
    );
    expect(plan.cautions).toEqual([...ANNEALING_CAUTIONS]);
    expect(plan.catalogueVersion).toBe('2026-12-01.1');
    expect(plan.totalDurationH).toBeCloseTo(57 / 30 + 6 + 31 / 30, 10);
    expect(JSON.parse(JSON.stringify(plan))).toEqual(plan);
  });
});

describe('generateAnnealingPlan: polycarbonate, Zakeri, Modares Mech. Eng. 13(6) 2013 [R]', () => {
  it('reproduces the published cycle segment by segment (6 mm, from 23 °C)', () => {
    const plan = generateAnnealingPlan({ guidance: POLYCARBONATE_ZAKERI_2013, maxSectionThicknessMm: 6 });
    // 20 °C/h to 100 °C, hold 3 h; 5 °C/h to 140 °C; 1 °C/h to 156 °C; cool at the same rates.
    expect(summary(plan)).toEqual([
      ['ramp', 23, 100, 20, 3.85],
      ['soak', 100, 100, null, 3],
      ['ramp', 100, 140, 5, 8],
      ['ramp', 140, 156, 1, 16],
      ['ramp', 156, 140, 1, 16],
      ['ramp', 140, 100, 5, 8],
      ['ramp', 100, 23, 20, 3.85],
    ]);
    expect(plan.totalDurationH).toBeCloseTo(3.85 + 3 + 8 + 16 + 16 + 8 + 3.85, 10);
    expect(plan.segments.map((s) => s.startH)).toEqual([0, 3.85, 6.85, 14.85, 30.85, 46.85, 54.85].map((x) => expect.closeTo(x, 10)));
    expect(plan.warnings).toEqual([]);
    // Drying first: the sheet maker's table gives 26 h at 125 °C for 6 mm [R].
    expect(plan.preSteps).toEqual([expect.objectContaining({ kind: 'drying', temperatureC: 125, durationH: 26 })]);
    expect(plan.sources.some((s) => s.document.startsWith('Zakeri') && s.flag === 'read')).toBe(true);
  });

  it('warns where the 20 °C/h ramps lag too much in 25 mm, proposing the rate whose lag is the allowed gradient', () => {
    const plan = generateAnnealingPlan({ guidance: POLYCARBONATE_ZAKERI_2013, maxSectionThicknessMm: 25 });
    const lagWarnings = plan.warnings.filter((w) => w.kind === 'lag_exceeds_gradient');
    expect(lagWarnings.map((w) => w.segmentNumber)).toEqual([1, 7]);
    const proposed = lagWarnings[0]!.numbers.proposedRateCPerH!;
    expect(proposed).toBeCloseTo(maxRateForAllowedLag({ allowedLagC: 2, halfThicknessMm: 12.5, diffusivityMm2PerS: 0.144 }), 10);
    expect(rampLagC({ rateCPerH: proposed, halfThicknessMm: 12.5, diffusivityMm2PerS: 0.144 })).toBeCloseTo(2, 10);
    expect(plan.rampChecks.find((c) => c.segmentNumber === 1)?.lagC).toBeCloseTo((20 / 3600) * 156.25 / 0.288, 10);
    expect(plan.warnings.some((w) => w.kind === 'beyond_table')).toBe(true); // drying beyond 8 mm
  });

  it('lengthens soaks to the equilibration time when the surface couples weakly (Bi 1, 40 mm) and says why', () => {
    const plan = generateAnnealingPlan({ guidance: POLYCARBONATE_ZAKERI_2013, maxSectionThicknessMm: 40, surfaceBiot: 1 });
    const top = plan.soakChecks[1]!;
    const expected = timeForCentreWithinTolerance({
      initialDifferenceC: rampLagC({ rateCPerH: 1, halfThicknessMm: 20, diffusivityMm2PerS: 0.144 }) * 3,
      toleranceC: 1,
      halfThicknessMm: 20,
      diffusivityMm2PerS: 0.144,
      biot: 1,
    });
    expect(top.temperatureC).toBe(156);
    expect(top.durationH).toBeCloseTo(expected.durationH, 10);
    expect(top.lengthenedBecause).toMatch(/one-term slab solution/);
    const topSegment = plan.segments.find((s) => s.kind === 'soak' && s.startTemperatureC === 156);
    expect(topSegment?.durationH).toBeCloseTo(expected.durationH, 10);
    expect(plan.soakChecks[0]!.durationH).toBeGreaterThan(3);
  });

  it('applies oven limits: refuses a plan above the oven maximum, warns below the slowest ramp', () => {
    expect(() => generateAnnealingPlan({ guidance: POLYCARBONATE_ZAKERI_2013, maxSectionThicknessMm: 6, ovenLimits: { maxTemperatureC: 150 } })).toThrow(
      expect.objectContaining({ code: 'precondition_failed' }),
    );
    const plan = generateAnnealingPlan({ guidance: POLYCARBONATE_ZAKERI_2013, maxSectionThicknessMm: 6, ovenLimits: { minRateCPerH: 2, maxHeatingRateCPerH: 10 } });
    expect(plan.warnings.filter((w) => w.kind === 'rate_below_oven_minimum').map((w) => w.segmentNumber)).toEqual([4, 5]);
    expect(plan.warnings[0]?.numbers).toMatchObject({ stepRampH: 0.5, stepHoldH: 0.5 });
    expect(plan.segments[0]?.rateCPerH).toBe(10);
    expect(plan.segments[6]?.rateCPerH).toBe(20); // cooling is not limited by the heating limit
  });
});

describe('generateAnnealingPlan: other materials', () => {
  it('epoxy: Tg 130 °C [R] + 10 °C, 1 °C/h to Tg − 40 °C, then 5 °C/h (handbook practice, from memory)', () => {
    const plan = generateAnnealingPlan({ guidance: CAST_EPOXY_GUIDANCE, maxSectionThicknessMm: 10 });
    expect(summary(plan)).toEqual([
      ['ramp', 23, 140, 5, 23.4],
      ['soak', 140, 140, null, 1],
      ['ramp', 140, 90, 1, 50],
      ['ramp', 90, 30, 5, 12],
    ]);
    expect(plan.sources.filter((s) => s.document.startsWith('Experimental stress analysis handbooks')).every((s) => s.flag === 'from_memory')).toBe(true);
  });

  it('glass: slow-cooling rate falls with the square of thickness [C]', () => {
    const rate = (t: number) => generateAnnealingPlan({ guidance: SODA_LIME_GLASS_GUIDANCE, maxSectionThicknessMm: t }).segments[2]!.rateCPerH!;
    expect(rate(6) / rate(12)).toBeCloseTo(4, 1);
    expect(rate(10)).toBe(Math.floor(12384 / 100 * 10) / 10);
  });

  it('refuses a start above the soak and a malformed guidance entry', () => {
    expect(() => generateAnnealingPlan({ guidance: CAST_ACRYLIC_GUIDANCE, maxSectionThicknessMm: 6, startTemperatureC: 85 })).toThrow(DomainError);
    try {
      generateAnnealingPlan({ guidance: { ...CAST_ACRYLIC_GUIDANCE, allowedGradientC: { value: -1 } }, maxSectionThicknessMm: 6 });
      expect.unreachable();
    } catch (e) {
      expect((e as DomainError).code).toBe('invalid_input');
      expect((e as DomainError).problems.map((p) => p.field)).toEqual(['allowedGradientC.value', 'allowedGradientC.source']);
    }
  });
});
