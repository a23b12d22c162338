import { describe, expect, it } from 'vitest';
import { dryingDuration } from '../../../src/annealing/dryingDuration.ts';
import { POLYCARBONATE_DRYING } from '../../../src/annealing/polycarbonateDrying.ts';

describe('dryingDuration', () => {
  // A polycarbonate sheet maker's drying table at 125 °C [R]: 1 mm 1.5 h … 6 mm 26 h, 8 mm 45 h.
  it.each([
    [1, 1.5],
    [3, 7],
    [6, 26],
    [7, 45], // between rows: the next thicker row
    [8, 45],
  ])('%s mm dries for %s h', (t, h) => {
    expect(dryingDuration(POLYCARBONATE_DRYING, t)).toMatchObject({ durationH: h, extrapolated: false });
  });

  it('extrapolates past the table as thickness² and says so [C, diffusion time ∝ thickness²]', () => {
    const r = dryingDuration(POLYCARBONATE_DRYING, 10);
    expect(r.extrapolated).toBe(true);
    expect(r.durationH).toBeCloseTo(45 * (10 / 8) ** 2, 0);
    expect(r.note).toMatch(/beyond the table/);
  });
});
