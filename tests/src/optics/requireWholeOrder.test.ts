import { describe, expect, it } from 'vitest';
import { requireWholeOrder } from '../../../src/optics/requireWholeOrder.ts';
import { DomainError } from '../../../src/errors/DomainError.ts';

describe('requireWholeOrder', () => {
  it('passes integers ≥ 0 and names the field of anything else', () => {
    expect(requireWholeOrder('n', 0)).toBe(0);
    expect(requireWholeOrder('n', 12)).toBe(12);
    for (const bad of [0.5, -1, Number.NaN]) {
      try {
        requireWholeOrder('lowerOrder', bad);
        expect.unreachable();
      } catch (e) {
        expect(e).toBeInstanceOf(DomainError);
        expect((e as DomainError).code).toBe('invalid_input');
        expect((e as DomainError).problems[0]?.field).toBe('lowerOrder');
      }
    }
  });
});
