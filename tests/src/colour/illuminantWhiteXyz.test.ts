import fc from 'fast-check';
import { converter } from 'culori';
import { describe, expect, it } from 'vitest';
import { cieD65RelativePower5Nm } from '../../../src/colour/data/cieD65RelativePower5Nm.ts';
import type { IlluminantSpec } from '../../../src/colour/Illuminant.ts';
import { illuminantWhiteXyz } from '../../../src/colour/illuminantWhiteXyz.ts';
import { DomainError } from '../../../src/errors/DomainError.ts';

const grid = Array.from({ length: 81 }, (_, i) => 380 + 5 * i);

describe('illuminantWhiteXyz', () => {
  it('gives the D65 white X 0.95047, Z 1.08883 at Y = 1 [M: CIE 015 tristimulus values of D65, from memory]', () => {
    const w = illuminantWhiteXyz('D65');
    expect(w.y).toBe(1);
    expect(w.x).toBeCloseTo(0.95047, 3);
    expect(w.z).toBeCloseTo(1.08883, 3);
  });

  it('agrees with culori’s D65 white (sRGB white in xyz65) to 3 decimals [culori as reference library]', () => {
    const white = converter('xyz65')('#ffffff')!;
    const w = illuminantWhiteXyz('D65');
    expect(w.x).toBeCloseTo(white.x, 3);
    expect(w.z).toBeCloseTo(white.z, 3);
  });

  it('gives the illuminant A white X 1.09850, Z 0.35585 [M: CIE 015 tristimulus values of A, from memory]', () => {
    const w = illuminantWhiteXyz('A');
    expect(w.x).toBeCloseTo(1.0985, 4);
    expect(w.z).toBeCloseTo(0.35585, 4);
  });

  it('gives X = Y = Z for the equal-energy illuminant (the CMFs have equal areas) [R: CIE 1931 definition]', () => {
    const w = illuminantWhiteXyz('E');
    expect(w.x).toBeCloseTo(1, 4);
    expect(w.z).toBeCloseTo(1, 4);
  });

  it('treats a measured lamp equal to the D65 table as D65 [C]', () => {
    const lamp = { wavelengthNm: grid, relativePower: [...cieD65RelativePower5Nm.relativePower] };
    const w = illuminantWhiteXyz(lamp);
    const d65 = illuminantWhiteXyz('D65');
    expect(w.x).toBeCloseTo(d65.x, 12);
    expect(w.z).toBeCloseTo(d65.z, 12);
  });

  it('does not depend on the lamp’s scale (fast-check)', () => {
    const base = grid.map((nm) => 1 + ((nm - 380) / 400) ** 2);
    const reference = illuminantWhiteXyz({ wavelengthNm: grid, relativePower: base });
    fc.assert(
      fc.property(fc.double({ min: 1e-6, max: 1e6, noNaN: true }), (k) => {
        const w = illuminantWhiteXyz({ wavelengthNm: grid, relativePower: base.map((p) => p * k) });
        expect(w.y).toBe(1);
        expect(w.x).toBeCloseTo(reference.x, 10);
        expect(w.z).toBeCloseTo(reference.z, 10);
      }),
    );
  });

  it('refuses an unknown illuminant', () => {
    expect(() => illuminantWhiteXyz('D50' as IlluminantSpec)).toThrow(DomainError);
  });
});
