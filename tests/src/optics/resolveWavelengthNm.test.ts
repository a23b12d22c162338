import { describe, expect, it } from 'vitest';
import { resolveWavelengthNm } from '../../../src/optics/resolveWavelengthNm.ts';

describe('resolveWavelengthNm', () => {
  it('takes 577 nm for white light [M: tint of passage] and a stated visible wavelength as given', () => {
    expect(resolveWavelengthNm({ wavelengthNm: null })).toBe(577);
    // Sodium D line 589.3 nm and mercury green 546.1 nm, the usual monochromatic sources [M].
    expect(resolveWavelengthNm({ wavelengthNm: 589.3 })).toBe(589.3);
    expect(resolveWavelengthNm({ wavelengthNm: 546.1 })).toBe(546.1);
    expect(resolveWavelengthNm({ wavelengthNm: 780 })).toBe(780);
  });
  it('refuses light outside 380–780 nm', () => {
    expect(() => resolveWavelengthNm({ wavelengthNm: 379.9 })).toThrow(/at least 380/);
    expect(() => resolveWavelengthNm({ wavelengthNm: 632.8e3 })).toThrow(/at most 780/);
  });
});
