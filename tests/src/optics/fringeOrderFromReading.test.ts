import { describe, expect, it } from 'vitest';
import { fringeOrderFromReading } from '../../../src/optics/fringeOrderFromReading.ts';
import type { ReadingMethodInput } from '../../../src/optics/ReadingMethodInput.ts';
import { WHITE_LIGHT_EFFECTIVE_WAVELENGTH_NM } from '../../../src/optics/readingDefaults.ts';

describe('fringeOrderFromReading', () => {
  it('uses 577 nm for white light, the tint of passage [M: Dally & Riley colour table]', () => {
    expect(WHITE_LIGHT_EFFECTIVE_WAVELENGTH_NM).toBe(577);
    const r = fringeOrderFromReading({ method: 'tardy', lowerOrder: 1, analyzerRotationDeg: 54, movedFringe: 'upper' }, { wavelengthNm: null });
    expect(r.wavelengthNm).toBe(577);
    expect(r.fringeOrder).toEqual({ value: 1.7, uncertainty: 0.02 });
    expect(r.retardationNm.value).toBeCloseTo(980.9, 9);
    expect(r.retardationNm.uncertainty).toBeCloseTo(11.54, 9);
    expect(r.formula).toContain('Tardy');
  });

  it('dispatches every method with its default uncertainty', () => {
    const light = { wavelengthNm: 546.1 };
    const cases: [ReadingMethodInput, number, number][] = [
      [{ method: 'whole_order', wholeOrder: 4 }, 4, 0.1],
      [{ method: 'tardy', lowerOrder: 0, analyzerRotationDeg: 18, movedFringe: 'lower' }, 0.1, 0.02],
      [{ method: 'senarmont', wholeOrder: 1, analyzerRotationDeg: 90 }, 1.5, 0.02],
      [{ method: 'compensator', retardationNm: 273.05 }, 0.5, 5 / Math.sqrt(12) / 546.1],
      [{ method: 'direct', fringeOrder: 0.6 }, 0.6, 0.2],
    ];
    for (const [reading, order, u] of cases) {
      const r = fringeOrderFromReading(reading, light);
      expect(r.fringeOrder.value).toBeCloseTo(order, 12);
      expect(r.fringeOrder.uncertainty).toBeCloseTo(u, 12);
      expect(r.wavelengthNm).toBe(546.1);
      // δ = N·λ [R: ASTM D4093]
      expect(r.retardationNm.value).toBeCloseTo(order * 546.1, 9);
      expect(r.retardationNm.uncertainty).toBeCloseTo(u * 546.1, 9);
    }
  });

  it('keeps a compensator’s own retardation reading as the retardation', () => {
    const r = fringeOrderFromReading({ method: 'compensator', retardationNm: 150 }, { wavelengthNm: 589.3 }, 0.004);
    expect(r.retardationNm.value).toBe(150);
    expect(r.retardationNm.uncertainty).toBeCloseTo(0.004 * 589.3, 12);
  });

  it('lets an explicit uncertainty override the default', () => {
    const r = fringeOrderFromReading({ method: 'whole_order', wholeOrder: 2 }, { wavelengthNm: null }, 0.25);
    expect(r.fringeOrder.uncertainty).toBe(0.25);
  });

  it('refuses a wavelength outside 380–780 nm and an unknown method', () => {
    const reading: ReadingMethodInput = { method: 'direct', fringeOrder: 0.5 };
    expect(() => fringeOrderFromReading(reading, { wavelengthNm: 1064 })).toThrow(/wavelengthNm/);
    expect(() => fringeOrderFromReading(reading, { wavelengthNm: 300 })).toThrow(/wavelengthNm/);
    expect(fringeOrderFromReading(reading, { wavelengthNm: 380 }).wavelengthNm).toBe(380);
    const bogus = { method: 'guess', fringeOrder: 1 } as unknown as ReadingMethodInput;
    expect(() => fringeOrderFromReading(bogus, { wavelengthNm: null })).toThrow(/unknown reading method/);
  });
});
