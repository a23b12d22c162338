import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { createRequire } from 'node:module';
import { standardDeviation } from 'simple-statistics';
import { fitFringeValueThroughOrigin } from '../../../src/calibration/fitFringeValueThroughOrigin.ts';
import { repeatableNormal } from '../uncertainty/support/monteCarlo.ts';

// jstat ships no types; only its least-squares solver is used here, as an outside reference.
const jStat = createRequire(import.meta.url)('jstat') as { lstsq(a: number[][], b: number[][]): number[][] };

const pts = (xs: number[], ys: number[]) => xs.map((fringeOrder, i) => ({ fringeOrder, stressLikeNPerMm: ys[i] as number }));

describe('fitFringeValueThroughOrigin', () => {
  it('matches a hand-solved fit: N = 1, 2, 3; q = 2, 4, 7 [C]', () => {
    // ΣNq = 31, ΣN² = 14: fσ = 31/14; SSE = Σq² − (ΣNq)²/ΣN² = 69 − 961/14 = 5/14;
    // s² = SSE/2 = 5/28; u(fσ)² = s²/ΣN² = 5/392.
    const r = fitFringeValueThroughOrigin(pts([1, 2, 3], [2, 4, 7]), 577);
    expect(r.fringeValueNPerMm.value).toBeCloseTo(31 / 14, 12);
    expect(r.fringeValueNPerMm.uncertainty).toBeCloseTo(Math.sqrt(5 / 392), 12);
    expect(r.residualStandardDeviationNPerMm).toBeCloseTo(Math.sqrt(5 / 28), 12);
    expect(r.degreesOfFreedom).toBe(2);
    expect(r.pointCount).toBe(3);
    expect(r.wavelengthNm).toBe(577);
  });

  it('gives the same slope as jstat’s least-squares solver (reference library)', () => {
    const xs = [0.6, 1.3, 2.1, 2.8, 3.5, 4.4];
    const ys = [6.4, 14.1, 22.7, 30.6, 37.9, 48.1];
    const ref = jStat.lstsq(xs.map((x) => [x]), ys.map((y) => [y]))[0]?.[0] as number;
    expect(fitFringeValueThroughOrigin(pts(xs, ys), 546.1).fringeValueNPerMm.value).toBeCloseTo(ref, 10);
  });

  it('reports an uncertainty that matches the scatter of repeated simulated calibrations [C]', () => {
    // 4000 simulated series of 5 load steps with q = 11·N + noise(0.3): the spread of fitted
    // slopes must match the root-mean-square of the reported u(fσ) (E[s²] = σ², unbiased).
    const noise = repeatableNormal(4242);
    const xs = [1, 2, 3, 4, 5];
    const slopes: number[] = [];
    let meanUSquared = 0;
    const series = 4000;
    for (let k = 0; k < series; k++) {
      const ys = xs.map((x) => noise({ value: 11 * x, uncertainty: 0.3 }));
      const r = fitFringeValueThroughOrigin(pts(xs, ys), 577);
      slopes.push(r.fringeValueNPerMm.value);
      meanUSquared += r.fringeValueNPerMm.uncertainty ** 2 / series;
    }
    const exactSd = 0.3 / Math.sqrt(55);
    expect(Math.abs(standardDeviation(slopes) / exactSd - 1)).toBeLessThan(0.04);
    expect(Math.abs(Math.sqrt(meanUSquared) / exactSd - 1)).toBeLessThan(0.04);
  });

  it('has zero uncertainty on exactly proportional data and scales with q (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.1, max: 300, noNaN: true }), fc.uniqueArray(fc.double({ min: 0.05, max: 20, noNaN: true }), { minLength: 3, maxLength: 10 }), (f, xs) => {
        const r = fitFringeValueThroughOrigin(pts(xs, xs.map((x) => f * x)), 577);
        expect(r.fringeValueNPerMm.value).toBeCloseTo(f, 8);
        expect(r.fringeValueNPerMm.uncertainty).toBeLessThan(1e-9 * f);
      }),
    );
  });

  it('refuses fewer than 3 points or fewer than 2 distinct non-zero orders', () => {
    expect(() => fitFringeValueThroughOrigin(pts([1, 2], [7, 14]), 577)).toThrow(/at least 3 points/);
    expect(() => fitFringeValueThroughOrigin(pts([2, 2, 0], [14, 14.2, 0]), 577)).toThrow(/distinct/);
    expect(() => fitFringeValueThroughOrigin(pts([1, -2, 3], [7, 14, 21]), 577)).toThrow(/fringeOrder/);
    expect(() => fitFringeValueThroughOrigin(pts([1, 2, 3], [7, 14, 21]), 300)).toThrow(/wavelengthNm/);
  });
});
