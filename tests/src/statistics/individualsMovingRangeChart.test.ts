import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { DomainError } from '../../../src/errors/DomainError.ts';
import {
  individualsMovingRangeChart,
  type IndividualsMovingRangeChart,
} from '../../../src/statistics/individualsMovingRangeChart.ts';

const chartOf = (values: number[]): IndividualsMovingRangeChart => {
  const chart = individualsMovingRangeChart(values.map((value, i) => ({ x: i + 1, value })));
  if (!chart.defined) throw new Error(chart.reason);
  return chart;
};

const series = fc.array(fc.integer({ min: 0, max: 500 }).map((i) => i / 1000), { minLength: 2, maxLength: 40 });

describe('individualsMovingRangeChart', () => {
  it('works a four-point series by hand [C]', () => {
    const chart = chartOf([0.1, 0.14, 0.12, 0.16]);
    // x̄ = 0.13; moving ranges 0.04, 0.02, 0.04, so MR̄ = 0.1/3
    expect(chart.centreLine).toBeCloseTo(0.13, 14);
    expect(chart.meanMovingRange).toBeCloseTo(0.1 / 3, 14);
    expect(chart.individuals.upperLimit).toBeCloseTo(0.13 + (2.66 * 0.1) / 3, 14);
    expect(chart.individuals.lowerLimit).toBeCloseTo(0.13 - (2.66 * 0.1) / 3, 14);
    expect(chart.movingRangeChart.upperLimit).toBeCloseTo((3.267 * 0.1) / 3, 14);
    expect(chart.sigmaEstimate).toBeCloseTo(0.1 / 3 / 1.128, 14);
    expect(chart.points.map((p) => p.movingRange)).toEqual([null, expect.closeTo(0.04, 14), expect.closeTo(0.02, 14), expect.closeTo(0.04, 14)]);
    expect(chart.warnings[0]).toMatch(/provisional/);
  });
  it('flags a jump beyond the limits on both charts', () => {
    const values = [0.1, 0.11, 0.1, 0.12, 0.11, 0.1, 0.11, 0.12, 0.1, 0.11, 0.4, 0.11];
    const chart = chartOf(values);
    expect(chart.points[10]!.rules).toContain('beyond_limits');
    expect(chart.points[10]!.movingRangeAboveLimit).toBe(true);
    expect(chart.points.filter((p) => p.rules.includes('beyond_limits'))).toHaveLength(1);
  });
  it('keeps limits symmetric about the centre line and MR limits at D4·MR̄ and 0', () => {
    fc.assert(
      fc.property(series, (values) => {
        const chart = chartOf(values);
        const up = chart.individuals.upperLimit - chart.centreLine;
        expect(chart.centreLine - chart.individuals.lowerLimit).toBeCloseTo(up, 12);
        expect(up).toBeCloseTo(2.66 * chart.meanMovingRange, 12);
        expect(chart.movingRangeChart).toEqual({ centreLine: chart.meanMovingRange, upperLimit: 3.267 * chart.meanMovingRange, lowerLimit: 0 });
      }),
    );
  });
  it('shifts centre line and limits by a constant added to every point and leaves MR̄ alone', () => {
    fc.assert(
      fc.property(series, fc.integer({ min: -1000, max: 1000 }).map((i) => i / 100), (values, c) => {
        const base = chartOf(values);
        const moved = chartOf(values.map((v) => v + c));
        expect(moved.centreLine).toBeCloseTo(base.centreLine + c, 10);
        expect(moved.individuals.upperLimit).toBeCloseTo(base.individuals.upperLimit + c, 10);
        expect(moved.individuals.lowerLimit).toBeCloseTo(base.individuals.lowerLimit + c, 10);
        expect(moved.meanMovingRange).toBeCloseTo(base.meanMovingRange, 10);
      }),
    );
  });
  it('lists the rules it applied, the 2-of-3 rule only when asked', () => {
    const points = [0.1, 0.2, 0.15].map((value, i) => ({ x: i, value }));
    const rulesOf = (chart: ReturnType<typeof individualsMovingRangeChart>): string[] =>
      chart.defined ? chart.rulesApplied.map((r) => r.rule) : [];
    expect(rulesOf(individualsMovingRangeChart(points))).toEqual(['beyond_limits', 'run_of_8_one_side', 'trend_of_6']);
    expect(rulesOf(individualsMovingRangeChart(points, { twoOfThreeBeyondTwoSigma: true }))).toContain('two_of_three_beyond_2_sigma');
  });
  it('is undefined below 2 points, warns below 20, and says when there is no variation', () => {
    expect(individualsMovingRangeChart([{ x: 'a', value: 0.1 }])).toMatchObject({ defined: false });
    expect(chartOf(Array.from({ length: 20 }, (_, i) => (i % 3) / 10)).warnings).toEqual([]);
    const flat = chartOf([0.2, 0.2, 0.2]);
    expect(flat.warnings.some((w) => /no point-to-point variation/.test(w))).toBe(true);
    expect(flat.points.every((p) => p.rules.length === 0)).toBe(true);
  });
  it('refuses non-finite values, naming the point', () => {
    expect(() => individualsMovingRangeChart([{ x: 1, value: 0.1 }, { x: 2, value: Number.NaN }])).toThrow(DomainError);
    expect(() => individualsMovingRangeChart([{ x: 1, value: 0.1 }, { x: 2, value: Number.NaN }])).toThrow(/points\[1\]\.value/);
  });
});
