import { describe, expect, it } from 'vitest';
import { requireMeasured } from '../../../src/uncertainty/requireMeasured.ts';
import { DomainError } from '../../../src/errors/DomainError.ts';

describe('requireMeasured', () => {
  it('passes a finite value with a non-negative uncertainty through', () => {
    expect(requireMeasured('thicknessMm', { value: 6, uncertainty: 0.05 }, { above: 0 })).toEqual({ value: 6, uncertainty: 0.05 });
  });
  it.each([
    [{ value: Number.NaN, uncertainty: 0.1 }, 'thicknessMm.value'],
    [{ value: 6, uncertainty: -0.1 }, 'thicknessMm.uncertainty'],
    [{ value: 6, uncertainty: Number.POSITIVE_INFINITY }, 'thicknessMm.uncertainty'],
    [{ value: 0, uncertainty: 0.1 }, 'thicknessMm.value'],
  ])('refuses %o naming %s', (bad, field) => {
    try {
      requireMeasured('thicknessMm', bad, { above: 0 });
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(DomainError);
      expect((e as DomainError).code).toBe('invalid_input');
      expect((e as DomainError).problems[0]?.field).toBe(field);
    }
  });
  it('refuses a missing measurement', () => {
    expect(() => requireMeasured('order', undefined as never)).toThrow(DomainError);
  });
});
