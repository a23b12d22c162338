import { describe, expect, it } from 'vitest';
import { CAST_ACRYLIC_GUIDANCE } from '../../../src/annealing/castAcrylicGuidance.ts';
import { resolveRampRate } from '../../../src/annealing/resolveRampRate.ts';

const table = CAST_ACRYLIC_GUIDANCE.cooling[0]!.rate;
const section = (t: number) => ({ thicknessMm: t, halfThicknessMm: t / 2, diffusivityMm2PerS: 0.109, allowedGradientC: 2 });

describe('resolveRampRate', () => {
  // A cast acrylic sheet maker's cooling table [R]: 1.5–4.5 mm 78, 6–9 mm 30, 12–18 mm 14, 24 mm 10,
  // 38–44 mm 6.7, 51 mm 5.6 °C/h.
  it.each([
    [1, 78],
    [4.5, 78],
    [5, 30],
    [18, 14],
    [24, 10],
    [30, 6.7],
    [51, 5.6],
  ])('%s mm reads %s °C/h from the table (gaps take the slower row)', (t, rate) => {
    expect(resolveRampRate(table, section(t)).rateCPerH).toBe(rate);
  });

  it('extrapolates beyond the last row as 1/thickness² with a warning [C]', () => {
    const r = resolveRampRate(table, section(60));
    expect(r.rateCPerH).toBe(Math.floor(5.6 * (51 / 60) ** 2 * 10) / 10);
    expect(r.warnings[0]?.kind).toBe('beyond_table');
  });

  it('takes the gradient-limited rate, rounded down, or a cap that is slower', () => {
    const free = resolveRampRate({ kind: 'from_gradient' }, section(25));
    expect(free.rateCPerH).toBe(10); // 10.045 °C/h rounded down
    const cap = { value: 8, source: { document: 'D', locator: 'L', flag: 'read' as const } };
    expect(resolveRampRate({ kind: 'from_gradient', capCPerH: cap }, section(25)).rateCPerH).toBe(8);
  });
});
