import { describe, expect, it } from 'vitest';
import { errorFunction } from 'simple-statistics';
import { monteCarlo, repeatableUniform } from './monteCarlo.ts';

describe('monteCarlo test support', () => {
  it('reproduces the sum of two normals, u = √(u1² + u2²) [M: standard result]', () => {
    const r = monteCarlo([{ value: 1, uncertainty: 0.3 }, { value: 2, uncertainty: 0.4 }], (a, b) => a + b);
    expect(r.value).toBeCloseTo(3, 2);
    expect(r.uncertainty).toBeCloseTo(0.5, 2);
  });
  it('draws normals: the share within ±1.96 u matches erf(1.96/√2) from simple-statistics [reference library]', () => {
    const expected = errorFunction(1.96 / Math.SQRT2);
    const u = repeatableUniform(7);
    let inside = 0;
    const n = 100_000;
    for (let i = 0; i < n; i++) {
      const z = Math.sqrt(-2 * Math.log(u())) * Math.cos(2 * Math.PI * u());
      if (Math.abs(z) <= 1.96) inside++;
    }
    expect(inside / n).toBeCloseTo(expected, 2);
  });
  it('is repeatable for one starting value', () => {
    const a = repeatableUniform(42);
    const b = repeatableUniform(42);
    expect([a(), a(), a()]).toEqual([b(), b(), b()]);
  });
});
