import { describe, expect, it } from 'vitest';
import { fringeValueForBatch } from '../../../src/calibration/fringeValueForBatch.ts';

const catalogue = { fringeValueNPerMm: { value: 7.0, uncertainty: 0.5 }, wavelengthNm: 577 };

describe('fringeValueForBatch', () => {
  it('falls back to the catalogue, converted in proportion to λ [C: fσ = λ/C, DESIGN §2]', () => {
    const out = fringeValueForBatch([], catalogue, 546.1);
    expect(out.source).toBe('catalogue');
    expect(out.fringeValueNPerMm.value).toBeCloseTo((7.0 * 546.1) / 577, 10);
    expect(out.fringeValueNPerMm.uncertainty).toBeCloseTo((0.5 * 546.1) / 577, 10);
  });

  it('prefers one batch calibration over the catalogue', () => {
    const out = fringeValueForBatch([{ fringeOrder: 5.5, fringeValueNPerMm: { value: 7.2, uncertainty: 0.05 }, wavelengthNm: 577 }], catalogue, 577);
    expect(out).toMatchObject({ source: 'batch_calibration', calibrationCount: 1, fringeValueNPerMm: { value: 7.2, uncertainty: 0.05 } });
  });

  it('weights two calibrations by inverse variance [C: hand computation]', () => {
    const out = fringeValueForBatch(
      [
        { fringeOrder: 4, fringeValueNPerMm: { value: 7.0, uncertainty: 0.1 }, wavelengthNm: 577 },
        { fringeOrder: 6, fringeValueNPerMm: { value: 7.3, uncertainty: 0.2 }, wavelengthNm: 577 },
      ],
      catalogue,
      577,
    );
    // weights 100 and 25: (700 + 182.5)/125 = 7.06; u = 1/√125 = 0.08944
    expect(out.fringeValueNPerMm.value).toBeCloseTo(7.06, 10);
    expect(out.fringeValueNPerMm.uncertainty).toBeCloseTo(0.0894427, 6);
  });

  it('fits three or more through the origin with orders brought to the reference wavelength', () => {
    // The same specimen read at 546.1 nm: N546 = N577·577/546.1, q = fσ·N unchanged, so fσ at 577 is recovered.
    const at546 = [1, 2, 3].map((n577) => ({ fringeOrder: (n577 * 577) / 546.1, fringeValueNPerMm: { value: (7 * 546.1) / 577, uncertainty: 0.05 }, wavelengthNm: 546.1 }));
    const out = fringeValueForBatch(at546, catalogue, 577);
    expect(out.method).toMatch(/least squares/);
    expect(out.fringeValueNPerMm.value).toBeCloseTo(7, 10);
  });
});
