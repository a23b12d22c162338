import { describe, expect, it } from 'vitest';
import type { PlanSegment } from '../../../src/annealing/AnnealingPlan.ts';
import { CAST_ACRYLIC_GUIDANCE } from '../../../src/annealing/castAcrylicGuidance.ts';
import { generateAnnealingPlan } from '../../../src/annealing/generateAnnealingPlan.ts';
import { measureSoakHolds } from '../../../src/annealing/measureSoakHolds.ts';
import { plannedTemperatures } from '../../../src/annealing/plannedTemperatures.ts';
import { piecewiseLog } from './support/piecewiseLog.ts';

const ramp = (number: number, startH: number, durationH: number, fromC: number, toC: number): PlanSegment => ({
  number, kind: 'ramp', label: 'ramp', startTemperatureC: fromC, endTemperatureC: toC, rateCPerH: Math.abs(toC - fromC) / durationH, durationH, startH,
});
const soak = (number: number, startH: number, durationH: number, atC: number): PlanSegment => ({
  number, kind: 'soak', label: 'soak', startTemperatureC: atC, endTemperatureC: atC, rateCPerH: null, durationH, startH,
});
// Invented plan: 20→80 °C at 30 °C/h (0–2 h), soak 4 h (2–6 h), 80→50 °C at 30 °C/h (6–7 h); samples every 0.25 h.
const plan = [ramp(1, 0, 2, 20, 80), soak(2, 2, 4, 80), ramp(3, 6, 1, 80, 50)];
const holds = (corners: [number, number][], bandC: number, endH = 8, segments = plan) => {
  const { timesH, temperaturesC } = piecewiseLog(corners, 0.25, endH);
  return measureSoakHolds(timesH, temperaturesC, segments, bandC);
};
const onPlan: [number, number][] = [[0, 20], [2, 80], [6, 80], [7, 50], [8, 50]];

describe('measureSoakHolds', () => {
  it('holds the planned 4 h on a log that follows the plan, ±2 °C: the ramps reach 78 °C between samples [C]', () => {
    expect(holds(onPlan, 2)).toEqual([{ segmentNumber: 2, temperatureC: 80, plannedH: 4, heldH: 4, fromH: 2, toH: 6 }]);
  });

  it('extends the run into the ramps on both sides when they lie within the band: ±10 °C from 1.75 h (72.5 °C) to 6.25 h (72.5 °C) [C]', () => {
    expect(holds(onPlan, 10)[0]).toMatchObject({ heldH: 4.5, fromH: 1.75, toH: 6.25 });
  });

  it('counts a sample exactly at the band edge as inside, and one just beyond it as outside [C]', () => {
    expect(holds([[0, 20], [1.75, 78], [2, 80], [6, 80], [7, 50], [8, 50]], 2)[0]).toMatchObject({ fromH: 1.75, heldH: 4.25 });
    expect(holds([[0, 20], [1.75, 77.99], [2, 80], [6, 80], [7, 50], [8, 50]], 2)[0]).toMatchObject({ fromH: 2, heldH: 4 });
  });

  it('credits an oven that arrives an hour late but holds the full time [C]', () => {
    expect(holds([[0, 20], [3, 80], [7, 80], [8, 50]], 2)[0]).toMatchObject({ heldH: 4, fromH: 3, toH: 7 });
  });

  it('takes the longest stretch when the oven leaves the band mid-soak: a dip at 3.5 h leaves 2.25 h from 3.75 h [C]', () => {
    const dip: [number, number][] = [[0, 20], [2, 80], [3.25, 80], [3.5, 75], [3.75, 80], [6, 80], [7, 50], [8, 50]];
    expect(holds(dip, 2)[0]).toMatchObject({ heldH: 2.25, fromH: 3.75, toH: 6 });
  });

  it('does not count a stretch that begins after the planned soak has ended', () => {
    expect(holds([[0, 20], [6.5, 80], [8, 80]], 2)[0]).toEqual({ segmentNumber: 2, temperatureC: 80, plannedH: 4, heldH: 0, fromH: null, toH: null });
  });

  it('ends a hold at the last sample when the log stops mid-soak', () => {
    expect(holds(onPlan, 2, 5)[0]).toMatchObject({ heldH: 3, fromH: 2, toH: 5 });
  });

  it('gives zero held time for a log that never reaches the soak, and for an empty log', () => {
    expect(holds([[0, 20], [8, 60]], 2)[0]).toMatchObject({ heldH: 0, fromH: null, toH: null });
    expect(measureSoakHolds([], [], plan, 2)).toEqual([{ segmentNumber: 2, temperatureC: 80, plannedH: 4, heldH: 0, fromH: null, toH: null }]);
  });

  it('measures each soak of a two-step cycle on its own samples, and returns nothing for a plan without soaks [C]', () => {
    const twoStep = [ramp(1, 0, 1, 20, 100), soak(2, 1, 3, 100), ramp(3, 4, 1, 100, 140), soak(4, 5, 2, 140), ramp(5, 7, 2, 140, 20)];
    const log: [number, number][] = [[0, 20], [1, 100], [4, 100], [5, 140], [6, 140], [6.25, 130], [6.5, 140], [7, 140], [9, 20]];
    expect(holds(log, 2, 9, twoStep).map((h) => [h.segmentNumber, h.temperatureC, h.heldH, h.fromH, h.toH])).toEqual([
      [2, 100, 3, 1, 4],
      [4, 140, 1, 5, 6],
    ]);
    expect(holds(onPlan, 2, 8, [plan[0]!, plan[2]!])).toEqual([]);
  });

  it('holds the full 6 h soak of a 6 mm cast acrylic cycle sampled every 0.1 h [R: makers’ guidance, 1 h per mm at 80 °C]', () => {
    const acrylic = generateAnnealingPlan({ guidance: CAST_ACRYLIC_GUIDANCE, maxSectionThicknessMm: 6 });
    const timesH = Array.from({ length: 92 }, (_, i) => i * 0.1);
    const log = plannedTemperatures(acrylic.segments, timesH).map((c) => c ?? 49);
    const [hold] = measureSoakHolds(timesH, log, acrylic.segments, 2);
    expect(hold).toMatchObject({ segmentNumber: 2, temperatureC: 80, plannedH: 6 });
    expect(hold!.heldH).toBeCloseTo(6, 9);
    expect(hold!.fromH).toBeCloseTo(1.9, 9);
    expect(hold!.toH).toBeCloseTo(7.9, 9);
  });
});
