import fc from 'fast-check';
import { mean } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import { DomainError } from '../../../src/errors/DomainError.ts';
import { arithmeticMean } from '../../../src/statistics/arithmeticMean.ts';

describe('arithmeticMean', () => {
  it('agrees with simple-statistics mean (reference library)', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: -1e3, max: 1e3, noNaN: true }), { minLength: 1, maxLength: 50 }), (xs) => {
        expect(arithmeticMean(xs)).toBeCloseTo(mean(xs), 9);
      }),
    );
  });
  it('refuses an empty list and non-finite entries, naming the field', () => {
    expect(() => arithmeticMean([])).toThrow(DomainError);
    expect(() => arithmeticMean([1, Number.NaN], 'orders')).toThrow(/orders\[1\]/);
  });
});
