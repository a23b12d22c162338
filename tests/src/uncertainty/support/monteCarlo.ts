import { mean, standardDeviation } from 'simple-statistics';
import type { Measured } from '../../../../src/uncertainty/Measured.ts';

// Test-only reference: an independent Monte Carlo propagation (GUM Supplement 1 style, from
// memory [M]) with a repeatable generator, so the first-order formulas are checked against
// something that never differentiates.

/** mulberry32: a small, well-known 32-bit repeatable generator; uniform on (0, 1). */
export function repeatableUniform(start: number): () => number {
  let a = start >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return (((t ^ (t >>> 14)) >>> 0) + 1) / 4294967297;
  };
}

/** Box–Muller normal draws from a repeatable uniform source. */
export function repeatableNormal(start: number): (m: Measured) => number {
  const u = repeatableUniform(start);
  return (m) => m.value + m.uncertainty * Math.sqrt(-2 * Math.log(u())) * Math.cos(2 * Math.PI * u());
}

/** Mean and standard deviation of f over `draws` independent normal draws of `inputs`. */
export function monteCarlo(
  inputs: readonly Measured[],
  f: (...xs: number[]) => number,
  { draws = 200_000, start = 20240611 } = {},
): Measured {
  const draw = repeatableNormal(start);
  const out = new Float64Array(draws);
  for (let i = 0; i < draws; i++) out[i] = f(...inputs.map(draw));
  const samples = Array.from(out);
  return { value: mean(samples), uncertainty: standardDeviation(samples) };
}
