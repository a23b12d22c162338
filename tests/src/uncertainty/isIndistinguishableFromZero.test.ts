import { describe, expect, it } from 'vitest';
import { isIndistinguishableFromZero } from '../../../src/uncertainty/isIndistinguishableFromZero.ts';
import { DomainError } from '../../../src/errors/DomainError.ts';

describe('isIndistinguishableFromZero', () => {
  it.each([
    [0.03, 0.02, 2, true],
    [0.04, 0.02, 2, true],
    [0.05, 0.02, 2, false],
    [-0.05, 0.02, 2, false],
    [0.05, 0.02, 3, true],
    [0, 0, 2, true],
  ])('value %d, u %d, k %d → %s [C: |x| ≤ k·u]', (value, uncertainty, k, expected) => {
    expect(isIndistinguishableFromZero({ value, uncertainty }, k)).toBe(expected);
  });
  it('refuses a non-positive coverage factor', () => {
    expect(() => isIndistinguishableFromZero({ value: 1, uncertainty: 0.1 }, 0)).toThrow(DomainError);
  });
});
