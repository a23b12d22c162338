import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { rampLagC } from '../../../src/annealing/rampLagC.ts';

/** Explicit finite-difference solution of the heat equation in a half slab whose surface ramps [C]. */
function simulatedCentreLagC(rateCPerH: number, halfThicknessMm: number, alpha: number): number {
  const nodes = 30;
  const dx = halfThicknessMm / nodes;
  const dt = (0.4 * dx * dx) / alpha;
  const rate = rateCPerH / 3600;
  const steps = Math.ceil((3 * halfThicknessMm * halfThicknessMm) / alpha / dt);
  let u = new Array<number>(nodes + 1).fill(0);
  for (let s = 1; s <= steps; s += 1) {
    const next = u.slice();
    next[0] = u[0]! + (alpha * dt * 2 * (u[1]! - u[0]!)) / (dx * dx);
    for (let i = 1; i < nodes; i += 1) next[i] = u[i]! + (alpha * dt * (u[i + 1]! - 2 * u[i]! + u[i - 1]!)) / (dx * dx);
    next[nodes] = rate * s * dt;
    u = next;
  }
  return u[nodes]! - u[0]!;
}

const pmma = { halfThicknessMm: 3, diffusivityMm2PerS: 0.109 };

describe('rampLagC', () => {
  it('30 °C/h in 6 mm cast acrylic lags 0.344 °C [C, by hand: (30/3600)·9/(2·0.109)]', () => {
    expect(rampLagC({ rateCPerH: 30, ...pmma })).toBeCloseTo(0.344, 3);
  });

  it('agrees within 1 % with a finite-difference solution of the heat equation [C, numerical check]', () => {
    expect(rampLagC({ rateCPerH: 30, ...pmma })).toBeCloseTo(simulatedCentreLagC(30, 3, 0.109), 2);
    const thick = rampLagC({ rateCPerH: 5, halfThicknessMm: 12.5, diffusivityMm2PerS: 0.144 });
    expect(Math.abs(thick - simulatedCentreLagC(5, 12.5, 0.144)) / thick).toBeLessThan(0.01);
  });

  it('scales with R and with L² (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.1, max: 500, noNaN: true }),
        fc.double({ min: 0.2, max: 60, noNaN: true }),
        fc.double({ min: 0.05, max: 1, noNaN: true }),
        fc.double({ min: 1.1, max: 10, noNaN: true }),
        (rate, half, alpha, k) => {
          const lag = rampLagC({ rateCPerH: rate, halfThicknessMm: half, diffusivityMm2PerS: alpha });
          expect(rampLagC({ rateCPerH: k * rate, halfThicknessMm: half, diffusivityMm2PerS: alpha })).toBeCloseTo(k * lag, 9);
          expect(rampLagC({ rateCPerH: rate, halfThicknessMm: k * half, diffusivityMm2PerS: alpha }) / lag).toBeCloseTo(k * k, 9);
        },
      ),
    );
  });

  it('treats a cooling ramp like a heating one', () => {
    expect(rampLagC({ rateCPerH: -30, ...pmma })).toBe(rampLagC({ rateCPerH: 30, ...pmma }));
  });
});
