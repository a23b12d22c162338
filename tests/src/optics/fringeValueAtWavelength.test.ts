import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { fringeValueAtWavelength } from '../../../src/optics/fringeValueAtWavelength.ts';

describe('fringeValueAtWavelength', () => {
  it('scales in proportion to λ and says dispersion is neglected [C: fσ = λ/C, C fixed]', () => {
    const r = fringeValueAtWavelength({ value: 7.0, uncertainty: 0.2 }, 577, 546.1);
    expect(r.fringeValueNPerMm.value).toBeCloseTo(6.6251, 4);
    expect(r.fringeValueNPerMm.uncertainty).toBeCloseTo(0.18929, 5);
    expect(r.wavelengthNm).toBe(546.1);
    expect(r.note).toMatch(/dispersion .* neglected/);
  });
  it('returns the same value through any wavelength and back (property)', () => {
    const lambda = fc.double({ min: 380, max: 780, noNaN: true });
    fc.assert(
      fc.property(fc.double({ min: 0.1, max: 500, noNaN: true }), fc.double({ min: 0, max: 50, noNaN: true }), lambda, lambda, (f, u, a, b) => {
        const there = fringeValueAtWavelength({ value: f, uncertainty: u }, a, b);
        const back = fringeValueAtWavelength(there.fringeValueNPerMm, b, a).fringeValueNPerMm;
        expect(back.value).toBeCloseTo(f, 9);
        expect(back.uncertainty).toBeCloseTo(u, 9);
      }),
    );
  });
  it('refuses a non-positive wavelength or fringe value', () => {
    expect(() => fringeValueAtWavelength({ value: 7, uncertainty: 0 }, 0, 546.1)).toThrow(/fromWavelengthNm/);
    expect(() => fringeValueAtWavelength({ value: -7, uncertainty: 0 }, 577, 546.1)).toThrow(/fringeValueNPerMm/);
  });
});
