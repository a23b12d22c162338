import { describe, expect, it } from 'vitest';
import { namedIsochromaticEntries } from '../../../src/colour/namedIsochromaticEntries.ts';
import { isochromaticNamedSequence } from '../../../src/colour/isochromaticNamedSequence.ts';
import { DomainError } from '../../../src/errors/DomainError.ts';

describe('isochromaticNamedSequence', () => {
  it('rises in retardation, and its fringe orders are δ/577 within 0.04 (the table rounds) [M: Dally & Riley, internal consistency C]', () => {
    isochromaticNamedSequence.forEach((entry, i) => {
      if (i > 0) expect(entry.retardationNm).toBeGreaterThan(isochromaticNamedSequence[i - 1]!.retardationNm);
      expect(Math.abs(entry.fringeOrder - entry.retardationNm / 577)).toBeLessThan(0.04);
    });
  });
  it('puts the tints of passage at N = 1 and 2 (577 and 1150 nm) [M: Dally & Riley]', () => {
    expect(namedIsochromaticEntries('purple, tint of passage').map((e) => e.retardationNm)).toEqual([577, 1150]);
  });
});

describe('namedIsochromaticEntries', () => {
  it('returns every order a name occurs in', () => {
    expect(namedIsochromaticEntries('orange').map((e) => e.retardationNm)).toEqual([460, 940]);
    expect(namedIsochromaticEntries('green').map((e) => e.retardationNm)).toEqual([1350, 1800]);
    expect(namedIsochromaticEntries('green-yellow').map((e) => e.retardationNm)).toEqual([800, 1450]);
    expect(namedIsochromaticEntries('deep blue').map((e) => e.retardationNm)).toEqual([620]);
  });
  it('ignores case and spacing and accepts common spellings', () => {
    expect(namedIsochromaticEntries('  Dull   RED ')[0]!.retardationNm).toBe(520);
    expect(namedIsochromaticEntries('gray')[0]!.retardationNm).toBe(160);
    expect(namedIsochromaticEntries('Tint of passage')).toHaveLength(2);
    expect(namedIsochromaticEntries('purple')).toHaveLength(2);
    expect(namedIsochromaticEntries('red-green transition')[0]!.retardationNm).toBe(1730);
  });
  it('refuses an unknown name and lists the known ones', () => {
    try {
      namedIsochromaticEntries('turquoise');
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(DomainError);
      expect((e as DomainError).problems[0]!.message).toContain('rose red');
    }
  });
});
