import { describe, expect, it } from 'vitest';
import { stressOpticCoefficientFromFringeValue } from '../../../src/optics/stressOpticCoefficientFromFringeValue.ts';

const exact = (value: number) => ({ value, uncertainty: 0 });
const brewsters = (fNPerMm: number, lambdaNm = 577) => stressOpticCoefficientFromFringeValue(exact(fNPerMm), lambdaNm).stressOpticCoefficientBr.value;

describe('stressOpticCoefficientFromFringeValue', () => {
  it('folds C = λ/fσ into brewsters: 577 nm / 7 N/mm = 82.4 Br [C: 1e-9 m / 1e3 N/m = 1e-12 1/Pa]', () => {
    const inSi = (577e-9 / 7.0e3) / 1e-12;
    expect(brewsters(7.0)).toBeCloseTo(inSi, 10);
    expect(brewsters(7.0)).toBeCloseTo(82.43, 2);
  });
  it('agrees with the catalogue pairs of fσ and C [M: Dally & Riley materials table, via REFERENCES]', () => {
    expect(Math.abs(brewsters(7.0) - 80) / 80).toBeLessThan(0.05); // polycarbonate ≈ 80 Br
    expect(brewsters(11)).toBeGreaterThan(50); // anhydride-cured epoxy 50–55 Br
    expect(brewsters(11)).toBeLessThan(55);
    expect(brewsters(130)).toBeGreaterThan(4); // cast acrylic 4–5 Br
    expect(brewsters(130)).toBeLessThan(5);
  });
  it('keeps the relative uncertainty of fσ', () => {
    const r = stressOpticCoefficientFromFringeValue({ value: 7.0, uncertainty: 0.2 }, 577).stressOpticCoefficientBr;
    expect(r.uncertainty / r.value).toBeCloseTo(0.2 / 7, 12);
  });
  it('refuses a non-positive fringe value', () => {
    expect(() => brewsters(0)).toThrow(/fringeValueNPerMm/);
  });
});
