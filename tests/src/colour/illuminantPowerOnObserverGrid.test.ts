import { describe, expect, it } from 'vitest';
import type { IlluminantSpec } from '../../../src/colour/Illuminant.ts';
import { illuminantPowerOnObserverGrid } from '../../../src/colour/illuminantPowerOnObserverGrid.ts';
import { DomainError } from '../../../src/errors/DomainError.ts';

const at = (nm: number) => (nm - 380) / 5;

describe('illuminantPowerOnObserverGrid', () => {
  it('gives D65 on the 81 wavelengths 380–780 nm: 49.9755 at 380 nm, 100 at 560 nm, 63.3828 at 780 nm [R: CIE data set 10.25039/CIE.DS.hjfjmt59]', () => {
    const power = illuminantPowerOnObserverGrid('D65');
    expect(power).toHaveLength(81);
    expect([power[at(380)], power[at(560)], power[at(780)]]).toEqual([49.9755, 100, 63.3828]);
  });

  it('hands out a copy, so a caller cannot change the CIE table', () => {
    illuminantPowerOnObserverGrid('D65')[at(560)] = 0;
    expect(illuminantPowerOnObserverGrid('D65')[at(560)]).toBe(100);
  });

  it('gives illuminant A at the tabulated wavelengths [M: CIE 015 Table T.1, from memory]', () => {
    const power = illuminantPowerOnObserverGrid('A');
    const table: [number, number][] = [[380, 9.7951], [400, 14.708], [500, 59.8611], [560, 100], [600, 129.043], [700, 198.261], [780, 241.675]];
    expect(power).toHaveLength(81);
    for (const [nm, s] of table) expect(power[at(nm)]).toBeCloseTo(s, 2);
  });

  it('gives the equal-energy illuminant as a constant [R: CIE 015, illuminant E]', () => {
    expect(illuminantPowerOnObserverGrid('E')).toEqual(new Array(81).fill(1));
  });

  it('resamples a measured lamp linearly onto the grid, zero where it was not measured [C]', () => {
    const power = illuminantPowerOnObserverGrid({ wavelengthNm: [400, 700], relativePower: [4, 7] });
    expect(power).toHaveLength(81);
    expect(power.slice(0, 4)).toEqual([0, 0, 0, 0]);
    expect(power[at(400)]).toBe(4);
    expect(power[at(550)]).toBeCloseTo(5.5, 12);
    expect(power[at(700)]).toBe(7);
    expect(power.slice(at(705))).toEqual(new Array(16).fill(0));
  });

  it('refuses an unknown illuminant name, a missing one and an unusable lamp as invalid_input', () => {
    const bad: unknown[] = ['F2', 'd65', null, undefined, 6500, { wavelengthNm: [450, 650], relativePower: [1, 1] }];
    for (const illuminant of bad) {
      expect(() => illuminantPowerOnObserverGrid(illuminant as IlluminantSpec)).toThrow(DomainError);
      try {
        illuminantPowerOnObserverGrid(illuminant as IlluminantSpec);
      } catch (e) {
        expect((e as DomainError).code).toBe('invalid_input');
      }
    }
  });
});
