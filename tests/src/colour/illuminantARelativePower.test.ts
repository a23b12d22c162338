import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { illuminantARelativePower } from '../../../src/colour/illuminantARelativePower.ts';
import { DomainError } from '../../../src/errors/DomainError.ts';

describe('illuminantARelativePower', () => {
  it('is 100 at 560 nm by definition [R: CIE 015 equation for illuminant A]', () => {
    expect(illuminantARelativePower(560)).toBeCloseTo(100, 10);
  });
  it('matches the tabulated illuminant A at 380, 400, 500, 600, 700, 780 nm [M: CIE 015 Table T.1, from memory]', () => {
    const table: [number, number][] = [[380, 9.7951], [400, 14.708], [500, 59.8611], [600, 129.043], [700, 198.261], [780, 241.675]];
    for (const [nm, s] of table) expect(illuminantARelativePower(nm)).toBeCloseTo(s, 2);
  });
  it('agrees within 0.1 % with Planck’s law at 2856 K using today’s c2 = 1.4388e-2 m·K [C]', () => {
    const planck = (nm: number) => Math.pow(nm, -5) / Math.expm1(1.4388e7 / (nm * 2856));
    for (let nm = 380; nm <= 780; nm += 20) {
      const expected = (100 * planck(nm)) / planck(560);
      expect(Math.abs(illuminantARelativePower(nm) / expected - 1)).toBeLessThan(1e-3);
    }
  });
  it('rises monotonically across the visible range (a 2856 K radiator peaks near 1 µm, Wien) [C]', () => {
    fc.assert(fc.property(fc.double({ min: 300, max: 900, noNaN: true }), (nm) => {
      expect(illuminantARelativePower(nm + 1)).toBeGreaterThan(illuminantARelativePower(nm));
    }));
  });
  it('refuses a non-positive wavelength', () => {
    expect(() => illuminantARelativePower(0)).toThrow(DomainError);
  });
});
