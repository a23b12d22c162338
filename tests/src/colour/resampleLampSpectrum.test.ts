import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { resampleLampSpectrum } from '../../../src/colour/resampleLampSpectrum.ts';
import { DomainError } from '../../../src/errors/DomainError.ts';

const problemsOf = (f: () => unknown): string[] => {
  try {
    f();
  } catch (e) {
    if (e instanceof DomainError) return e.problems.map((p) => `${p.field}: ${p.message}`);
  }
  return [];
};

describe('resampleLampSpectrum', () => {
  it('interpolates linearly and is zero outside the measured range [C]', () => {
    const lamp = { wavelengthNm: [380, 500, 780], relativePower: [10, 50, 90] };
    expect(resampleLampSpectrum(lamp, [300, 380, 440, 500, 640, 780, 800])).toEqual([0, 10, 30, 50, 70, 90, 0]);
  });
  it('reproduces the measured points exactly (property)', () => {
    fc.assert(fc.property(fc.array(fc.double({ min: 0, max: 1e3, noNaN: true }), { minLength: 3, maxLength: 40 }), (power) => {
      const wavelengthNm = power.map((_, i) => 390 + (i * 320) / (power.length - 1));
      const resampled = resampleLampSpectrum({ wavelengthNm, relativePower: power }, wavelengthNm);
      resampled.forEach((value, i) => expect(value).toBeCloseTo(power[i]!, 9));
    }));
  });
  it('refuses wavelengths that do not increase', () => {
    const p = problemsOf(() => resampleLampSpectrum({ wavelengthNm: [380, 500, 500, 780], relativePower: [1, 1, 1, 1] }, [450]));
    expect(p).toEqual(['illuminant.wavelengthNm/2: must be greater than the previous wavelength 500']);
  });
  it('refuses negative or non-finite power', () => {
    const p = problemsOf(() => resampleLampSpectrum({ wavelengthNm: [380, 500, 780], relativePower: [1, -2, Number.NaN] }, [450]));
    expect(p).toHaveLength(2);
  });
  it('refuses a spectrum that does not cover 400–700 nm', () => {
    const p = problemsOf(() => resampleLampSpectrum({ wavelengthNm: [420, 500, 780], relativePower: [1, 1, 1] }, [450]));
    expect(p).toEqual(['illuminant.wavelengthNm: must cover 400–700 nm, covers 420–780 nm']);
  });
  it('refuses mismatched lengths, a single point and an all-zero lamp', () => {
    expect(problemsOf(() => resampleLampSpectrum({ wavelengthNm: [380, 780], relativePower: [1] }, [450]))).toHaveLength(1);
    expect(problemsOf(() => resampleLampSpectrum({ wavelengthNm: [380], relativePower: [1] }, [450]))).toHaveLength(1);
    expect(problemsOf(() => resampleLampSpectrum({ wavelengthNm: [380, 780], relativePower: [0, 0] }, [450]))).toEqual([
      'illuminant.relativePower: is zero everywhere',
    ]);
  });
});
