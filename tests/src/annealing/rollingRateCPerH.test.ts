import fc from 'fast-check';
import { linearRegression } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import { rollingRateCPerH } from '../../../src/annealing/rollingRateCPerH.ts';
import { repeatableRandom } from './syntheticOvenLog.ts';

/** Irregular sample times (a logger that drifts, with one long gap) and a noisy ramp–hold–cool curve. */
function noisyLog(count: number, stream: number): { t: number[]; c: number[] } {
  const rand = repeatableRandom(stream);
  const t: number[] = [];
  const c: number[] = [];
  let now = 0;
  for (let i = 0; i < count; i += 1) {
    now += i === Math.floor(count / 3) ? 0.7 : 0.002 + 0.004 * rand();
    t.push(now);
    const ideal = Math.max(Math.min(23 + 14 * now, 80) - Math.max(0, now - 8) * 10, 23);
    c.push(ideal + 0.6 * (rand() - 0.5));
  }
  return { t, c };
}

describe('rollingRateCPerH', () => {
  it('equals simple-statistics linearRegression slope on the same window [reference library], across a gap and far from t = 0', () => {
    for (const [count, stream] of [[3000, 31], [100_000, 32]] as const) {
      const { t, c } = noisyLog(count, stream);
      const r = rollingRateCPerH(t, c, 0.5);
      const checked = [...Array(40).keys()].map((k) => Math.floor(((k + 0.5) / 40) * count)).concat(count - 1, Math.floor(count / 3) + 1).filter((i) => t[i]! - t[0]! >= 1);
      for (const i of checked) {
        const start = r.windowStart[i]!;
        expect(start).toBeGreaterThanOrEqual(0);
        expect(t[i]! - t[start]!).toBeGreaterThanOrEqual(0.5);
        // The window is the latest start that still spans the full width.
        if (start + 1 < i) expect(t[i]! - t[start + 1]!).toBeLessThan(0.5);
        const pairs = t.slice(start, i + 1).map((ti, n) => [ti, c[start + n]!]);
        expect(r.rateCPerH[i]).toBeCloseTo(linearRegression(pairs).m, 10);
      }
    }
  });

  it('gives no rate until a full window exists', () => {
    const r = rollingRateCPerH([0, 0.1, 0.2, 0.3], [20, 21, 22, 23], 0.5);
    expect(r).toEqual({ windowStart: [-1, -1, -1, -1], rateCPerH: [null, null, null, null] });
  });

  it('property: a noiseless linear segment of rate R gives slope R at every full window [C]', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -200, max: 200, noNaN: true }),
        fc.double({ min: -50, max: 1200, noNaN: true }),
        fc.double({ min: 0, max: 100, noNaN: true }),
        fc.double({ min: 0.001, max: 0.1, noNaN: true }),
        fc.double({ min: 0.05, max: 2, noNaN: true }),
        fc.integer({ min: 2, max: 400 }),
        (rateCPerH, interceptC, startH, stepH, windowH, count) => {
          const t = [...Array(count).keys()].map((i) => startH + i * stepH);
          const r = rollingRateCPerH(t, t.map((ti) => interceptC + rateCPerH * (ti - startH)), windowH);
          r.rateCPerH.forEach((rate, i) => {
            if (t[i]! - t[0]! >= windowH + 1e-9) expect(rate).not.toBeNull();
            if (rate !== null) expect(Math.abs(rate - rateCPerH)).toBeLessThan(1e-6 * (1 + Math.abs(rateCPerH) + Math.abs(interceptC) / windowH));
          });
        },
      ),
    );
  });

  it('property: across a corner the slope stays between the two sides’ rates (positively weighted mean) [C]', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -60, max: 60, noNaN: true }),
        fc.double({ min: -60, max: 60, noNaN: true }),
        fc.double({ min: 0.1, max: 0.9, noNaN: true }),
        (beforeCPerH, afterCPerH, cornerShare) => {
          const t = [...Array(200).keys()].map((i) => i * 0.005);
          const cornerH = cornerShare;
          const c = t.map((ti) => 80 + beforeCPerH * Math.min(ti, cornerH) + afterCPerH * Math.max(0, ti - cornerH));
          for (const rate of rollingRateCPerH(t, c, 0.5).rateCPerH) {
            if (rate === null) continue;
            expect(rate).toBeLessThanOrEqual(Math.max(beforeCPerH, afterCPerH) + 1e-6);
            expect(rate).toBeGreaterThanOrEqual(Math.min(beforeCPerH, afterCPerH) - 1e-6);
          }
        },
      ),
    );
  });
});
