import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { DomainError } from '../../../src/errors/DomainError.ts';
import { fringeOrderFromColourReading } from '../../../src/optics/fringeOrderFromColourReading.ts';
import { fringeOrderFromReading } from '../../../src/optics/fringeOrderFromReading.ts';

describe('fringeOrderFromColourReading', () => {
  it('reads the first tint of passage as one fringe at 577 nm [M: Dally & Riley isochromatic colour table]', () => {
    const r = fringeOrderFromColourReading({ method: 'white_light_colour', namedColour: 'purple, tint of passage' }, 577);
    expect(r.fringeOrder.value).toBeCloseTo(1, 10);
    // the name recurs at 1150 nm (second tint), so the reading is flagged, not silently taken
    expect(r.ambiguous).toBe(true);
    expect(r.candidates.map((c) => c.retardationNm.value)).toEqual([577, 1150]);
  });

  it('gives deep blue its table retardation, N = 620/577 [M: Dally & Riley table; C: δ/λ]', () => {
    const r = fringeOrderFromColourReading({ method: 'white_light_colour', namedColour: 'deep blue' }, 577);
    expect(r.fringeOrder.value).toBeCloseTo(620 / 577, 10);
    expect(r.retardationNm.value).toBe(620);
    expect(r.formula).toContain("table entry 'deep blue'");
  });

  it('expresses the matched retardation at the stated wavelength, N = δ/λ [R: ASTM D4093]', () => {
    const at577 = fringeOrderFromColourReading({ method: 'white_light_colour', retardationNm: 800 }, 577);
    const at546 = fringeOrderFromColourReading({ method: 'white_light_colour', retardationNm: 800 }, 546.1);
    expect(at546.retardationNm.value).toBeCloseTo(at577.retardationNm.value, 6);
    expect(at546.fringeOrder.value).toBeCloseTo(at577.retardationNm.value / 546.1, 9);
  });

  it('replaces the colour-discrimination uncertainty with an explicit one and scales it by λ', () => {
    const r = fringeOrderFromColourReading({ method: 'white_light_colour', retardationNm: 300 }, 577, 0.05);
    expect(r.fringeOrder.uncertainty).toBe(0.05);
    expect(r.retardationNm.uncertainty).toBeCloseTo(0.05 * 577, 10);
  });

  it('refuses none or several colours with a named field', () => {
    expect(() => fringeOrderFromColourReading({ method: 'white_light_colour' }, 577)).toThrow(DomainError);
    expect(() => fringeOrderFromColourReading({ method: 'white_light_colour', srgbHex: '#2f2ed1', retardationNm: 577 }, 577)).toThrow(/exactly one/);
  });

  it('is what the reading dispatcher stores for white light', () => {
    const direct = fringeOrderFromColourReading({ method: 'white_light_colour', srgbHex: '#2f2ed1' }, 577);
    const dispatched = fringeOrderFromReading({ method: 'white_light_colour', srgbHex: '#2f2ed1' }, { wavelengthNm: null });
    expect(dispatched).toEqual({ fringeOrder: direct.fringeOrder, formula: direct.formula, retardationNm: direct.retardationNm, wavelengthNm: 577 });
  });

  it('finds a point picked on the scale again as its best candidate (property)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 40, max: 1700 }), (deltaNm) => {
        const r = fringeOrderFromColourReading({ method: 'white_light_colour', retardationNm: deltaNm }, 577);
        expect(r.candidates[0]!.deltaE2000).toBeCloseTo(0, 6);
        expect(Math.abs(r.retardationNm.value - deltaNm)).toBeLessThanOrEqual(Math.max(5, 3 * r.retardationNm.uncertainty));
      }),
      { numRuns: 15, seed: 20261121 },
    );
  });
});
