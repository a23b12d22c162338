import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { xyzAtRetardation } from '../../../src/colour/xyzAtRetardation.ts';
import { illuminantPowerOnObserverGrid } from '../../../src/colour/illuminantPowerOnObserverGrid.ts';
import type { IlluminantSpec } from '../../../src/colour/Illuminant.ts';
import { DomainError } from '../../../src/errors/DomainError.ts';

const luminanceMinima = (illuminant: IlluminantSpec, toNm: number): number[] => {
  const y = Array.from({ length: toNm + 1 }, (_, d) => xyzAtRetardation(d, illuminant).y);
  return y.flatMap((v, d) => (d > 0 && d < toNm && v < y[d - 1]! && v <= y[d + 1]! ? [d] : []));
};

describe('xyzAtRetardation', () => {
  it('is black at zero retardation (dark field)', () => {
    expect(xyzAtRetardation(0, 'D65')).toEqual({ x: 0, y: 0, z: 0 });
  });
  it('puts the luminance minima near 555/1115/1675 nm in equal-energy light [C: REFERENCES physics check]', () => {
    const minima = luminanceMinima('E', 1800);
    expect(minima).toHaveLength(3);
    [555, 1115, 1675].forEach((nm, i) => expect(Math.abs(minima[i]! - nm)).toBeLessThanOrEqual(4));
  });
  it('puts them near 565/1135/1710 nm under illuminant A [C: REFERENCES physics check]', () => {
    const minima = luminanceMinima('A', 1800);
    expect(minima).toHaveLength(3);
    [565, 1135, 1710].forEach((nm, i) => expect(Math.abs(minima[i]! - nm)).toBeLessThanOrEqual(4));
  });
  it('puts the first minimum (tint of passage) in 545–580 nm for D65, E and A; published sequence 577 nm [M: Dally & Riley]', () => {
    for (const illuminant of ['D65', 'E', 'A'] as const) {
      const first = luminanceMinima(illuminant, 700)[0]!;
      expect(first).toBeGreaterThanOrEqual(545);
      expect(first).toBeLessThanOrEqual(580);
    }
  });
  it('has its first-order brightness peak at about half the ȳ peak wavelength, 555/2 nm [C]', () => {
    const y = Array.from({ length: 501 }, (_, d) => xyzAtRetardation(d, 'E').y);
    const peakNm = y.indexOf(Math.max(...y));
    expect(Math.abs(peakNm - 277.5)).toBeLessThanOrEqual(5);
  });
  it('tends to half the lamp white at high orders, where sin² averages ½ [C]', () => {
    // ~70 periods of the shortest-wavelength fringe, so the mean of sin² is ½ to ~0.3 %.
    let sum = 0;
    for (let i = 0; i < 10_000; i += 1) sum += xyzAtRetardation(10_000 + 3.7 * i, 'D65').y;
    expect(sum / 10_000).toBeCloseTo(0.5, 2);
  });
  it('follows sin²(πδ/λ0) for a narrow lamp at λ0 = 550 nm [C, two-beam interference]', () => {
    const lamp = { wavelengthNm: [400, 545, 550, 555, 700], relativePower: [0, 0, 1, 0, 0] };
    for (const d of [100, 275, 400, 550, 800]) {
      expect(xyzAtRetardation(d, lamp).y).toBeCloseTo(Math.sin((Math.PI * d) / 550) ** 2, 2);
    }
  });
  it('gives the same colour for a measured lamp equal to the D65 table as for D65 itself', () => {
    const wavelengthNm = Array.from({ length: 81 }, (_, i) => 380 + 5 * i);
    const lamp = { wavelengthNm, relativePower: illuminantPowerOnObserverGrid('D65') };
    expect(xyzAtRetardation(620, lamp)).toEqual(xyzAtRetardation(620, 'D65'));
  });
  it('is deterministic, finite and within 0..white for δ in 0..3000 nm (property)', () => {
    fc.assert(fc.property(fc.double({ min: 0, max: 3000, noNaN: true }), fc.constantFrom<IlluminantSpec>('D65', 'A', 'E'), (d, ill) => {
      const a = xyzAtRetardation(d, ill);
      expect(xyzAtRetardation(d, ill)).toEqual(a);
      expect(a.y).toBeGreaterThanOrEqual(0);
      expect(a.y).toBeLessThanOrEqual(1);
      expect(Number.isFinite(a.x) && Number.isFinite(a.z)).toBe(true);
    }));
  });
  it('refuses negative or non-finite retardation and unknown illuminants', () => {
    expect(() => xyzAtRetardation(-1, 'D65')).toThrow(DomainError);
    expect(() => xyzAtRetardation(Number.NaN, 'D65')).toThrow(DomainError);
    expect(() => xyzAtRetardation(100, 'F2' as IlluminantSpec)).toThrow(DomainError);
  });
});
