import { describe, expect, it } from 'vitest';
import { requireNumber } from '../../../src/guards/requireNumber.ts';
import { DomainError } from '../../../src/errors/DomainError.ts';

describe('requireNumber', () => {
  it('passes a value inside its bounds through unchanged', () => {
    expect(requireNumber('thicknessMm', 6.2, { above: 0, max: 100 })).toBe(6.2);
  });
  it.each([Number.NaN, Number.POSITIVE_INFINITY, -3, 0])('refuses %s for a positive quantity', (bad) => {
    expect(() => requireNumber('thicknessMm', bad, { above: 0 })).toThrow(DomainError);
  });
  it('names the field in the problem list', () => {
    try {
      requireNumber('wavelengthNm', 900, { min: 380, max: 780 });
      expect.unreachable();
    } catch (e) {
      expect((e as DomainError).problems[0]?.field).toBe('wavelengthNm');
    }
  });
});
