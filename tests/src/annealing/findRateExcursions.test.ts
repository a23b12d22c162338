import { describe, expect, it } from 'vitest';
import { CAST_ACRYLIC_GUIDANCE } from '../../../src/annealing/castAcrylicGuidance.ts';
import { findRateExcursions } from '../../../src/annealing/findRateExcursions.ts';
import { generateAnnealingPlan } from '../../../src/annealing/generateAnnealingPlan.ts';
import { plannedTemperatures } from '../../../src/annealing/plannedTemperatures.ts';
import { rollingRateCPerH } from '../../../src/annealing/rollingRateCPerH.ts';
import { piecewiseLog } from './support/piecewiseLog.ts';

// Invented plan: 20→80 °C at 30 °C/h (0–2 h), soak (2–4 h), 80→50 °C at 30 °C/h (4–5 h).
// Samples every 0.125 h and a 0.5 h window keep every time exact in binary, so window edges are exact.
const segments = [
  { number: 1, startH: 0, durationH: 2, rateCPerH: 30 },
  { number: 2, startH: 2, durationH: 2, rateCPerH: null },
  { number: 3, startH: 4, durationH: 1, rateCPerH: 30 },
];
const tol = { rateWindowH: 0.5, rateToleranceCPerH: 2, rateToleranceFraction: 0.1 };
const onPlan: [number, number][] = [[0, 20], [2, 80], [4, 80], [5, 50]];
const run = (corners: [number, number][], endH = 6, s = segments, t = tol) => {
  const { timesH, temperaturesC } = piecewiseLog(corners, 0.125, endH);
  return findRateExcursions(timesH, temperaturesC, s, t);
};

describe('findRateExcursions', () => {
  it('finds nothing on a log that follows the plan', () => {
    expect(run(onPlan)).toEqual([]);
  });

  it('finds a cool at 60 °C/h where 30 °C/h is planned as a fault, from the first to the last window beyond 35 °C/h [C: 30·1.1 + 2; slopes by hand]', () => {
    // Window 3.75–4.25 h fits −30 °C/h (within), 3.875–4.375 h fits −48 °C/h (beyond); at the far end
    // 4.125–4.625 h fits −48 °C/h and 4.25–4.75 h −30 °C/h.
    const findings = run([[0, 20], [2, 80], [4, 80], [4.5, 50], [6, 50]]);
    expect(findings).toHaveLength(1);
    const f = findings[0]!;
    expect(f).toMatchObject({ kind: 'rate_exceeded', severity: 'fault', atH: 3.875, untilH: 4.625 });
    expect(f.numbers.peakRateCPerH).toBeCloseTo(-60, 9);
    expect(f.numbers.plannedRateCPerH).toBe(30);
    expect(f.numbers.allowedCPerH).toBeCloseTo(35, 12);
    expect(f.message).toBe('Cooling at up to 60.0 °C/h (least-squares slope over 0.5 h) where the plan allows 30 °C/h, from 3.88 h to 4.63 h.');
  });

  it('finds too-fast heating as a remark only (the soak that follows relaxes it)', () => {
    const findings = run([[0, 20], [1, 80], [4, 80], [5, 50]]);
    expect(findings).toHaveLength(1);
    expect(findings[0]).toMatchObject({ kind: 'rate_exceeded', severity: 'remark', atH: 0 });
    expect(findings[0]!.numbers.peakRateCPerH).toBeCloseTo(60, 9);
  });

  it('accepts a rate exactly at the allowed one and flags one just above it [C]', () => {
    const flat = [{ number: 1, startH: 0, durationH: 10, rateCPerH: 10 }];
    const exact = { rateWindowH: 0.5, rateToleranceCPerH: 0, rateToleranceFraction: 0 };
    expect(run([[0, 20], [10, 120]], 10, flat, exact)).toEqual([]);
    expect(run([[0, 20], [10, 125]], 10, flat, exact)).toHaveLength(1);
  });

  it('judges a window across a corner by the faster segment it overlaps: ramp and soak 35 °C/h, the soak alone 2 °C/h [C]', () => {
    // The oven keeps heating at 30 °C/h for 0.5 h into the soak. The window 2–2.5 h still touches the
    // ramp's end and passes; the first window wholly inside the soak (2.125–2.625 h) is flagged, and
    // its fitted slope, 24 °C/h (by hand over its five samples), is the peak.
    const findings = run([[0, 20], [2.5, 95], [4, 95], [5, 50]]);
    const heating = findings.filter((f) => f.severity === 'remark');
    expect(heating).toHaveLength(1);
    expect(heating[0]).toMatchObject({ atH: 2.125, numbers: { plannedRateCPerH: 0, allowedCPerH: 2 } });
    expect(heating[0]!.numbers.peakRateCPerH).toBeCloseTo(24, 9);
  });

  it('splits an excursion where the direction turns: a 5 °C bump during the soak is a heating remark, then a cooling fault', () => {
    const findings = run([[0, 20], [2, 80], [2.5, 80], [3, 85], [3.5, 80], [4, 80], [5, 50]]);
    expect(findings.map((f) => [f.severity, Math.sign(f.numbers.peakRateCPerH!)])).toEqual([['remark', 1], ['fault', -1]]);
    for (const f of findings) expect(f.numbers.plannedRateCPerH).toBe(0);
    expect(findings[0]!.numbers.peakRateCPerH).toBeCloseTo(10, 9);
  });

  it('merges cooling excursions that restart within a window of the last one, though windows between pass; keeps them apart when farther [C]', () => {
    // Soak-time drops of 2.5 °C at 5 °C/h (the soak allows 2 °C/h), separated by a level stretch.
    const long = [{ number: 1, startH: 0, durationH: 2, rateCPerH: 30 }, { number: 2, startH: 2, durationH: 4, rateCPerH: null }];
    const twoDrops = (pauseH: number) => {
      const corners: [number, number][] = [[0, 20], [2, 80], [2.25, 80], [2.75, 77.5], [2.75 + pauseH, 77.5], [3.25 + pauseH, 75], [6, 75]];
      const { timesH, temperaturesC } = piecewiseLog(corners, 0.125, 6);
      return { rates: rollingRateCPerH(timesH, temperaturesC, 0.5).rateCPerH, found: findRateExcursions(timesH, temperaturesC, long, tol) };
    };
    // The windows ending at 3.125 and 3.25 h fit −1 °C/h, then the second drop's windows start at 3.375 h.
    const near = twoDrops(0.375);
    expect(near.rates[25]).toBeCloseTo(-1, 9);
    expect(near.found.map((f) => [f.atH, f.untilH])).toEqual([[2.125, 3.875]]);
    expect(near.found[0]!.numbers.peakRateCPerH).toBeCloseTo(-5, 9);
    // First drop's windows end at 3 h, the second's begin at 3.5 h: one window later, still the same excursion.
    expect(twoDrops(1).found.map((f) => [f.atH, f.untilH])).toEqual([[2.125, 4.5]]);
    expect(twoDrops(2).found.map((f) => [f.atH, f.untilH])).toEqual([[2.125, 3], [4.5, 5.5]]);
  });

  it('does not judge the log after the plan ends', () => {
    expect(run([...onPlan, [5.25, 20], [6, 20]])).toEqual([]);
  });

  it('finds nothing for an empty log or an empty plan', () => {
    expect(findRateExcursions([], [], segments, tol)).toEqual([]);
    expect(run([[0, 20], [0.5, 200], [1, 20]], 2, [])).toEqual([]);
  });

  it('finds a 60 °C/h cool in a 6 mm cast acrylic cycle planned at 30 °C/h [R: maker’s cooling table, 6–9 mm row]', () => {
    const plan = generateAnnealingPlan({ guidance: CAST_ACRYLIC_GUIDANCE, maxSectionThicknessMm: 6 });
    const coolStartH = plan.segments[2]!.startH;
    const timesH = Array.from({ length: 100 }, (_, i) => i * 0.1);
    const planned = plannedTemperatures(plan.segments, timesH);
    const log = timesH.map((t, i) => (t > coolStartH ? Math.max(80 - 60 * (t - coolStartH), 49) : planned[i]!));
    const findings = findRateExcursions(timesH, log, plan.segments, tol);
    expect(findings).toHaveLength(1);
    expect(findings[0]).toMatchObject({ severity: 'fault', numbers: { plannedRateCPerH: 30, allowedCPerH: 35 } });
    expect(findings[0]!.numbers.peakRateCPerH).toBeCloseTo(-60, 6);
    expect(findings[0]!.atH).toBeLessThan(coolStartH);
    expect(findings[0]!.untilH).toBeGreaterThan(coolStartH + 31 / 60);
  });
});
