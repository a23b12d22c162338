import { describe, expect, it } from 'vitest';
import { fringeOrderFromWholeCount } from '../../../src/optics/fringeOrderFromWholeCount.ts';

describe('fringeOrderFromWholeCount', () => {
  it('returns the counted order with ±0.1 fringe by default (common practice)', () => {
    expect(fringeOrderFromWholeCount(3)).toEqual({ fringeOrder: { value: 3, uncertainty: 0.1 }, formula: 'whole order counted: N = 3' });
    expect(fringeOrderFromWholeCount(0, 0.05).fringeOrder).toEqual({ value: 0, uncertainty: 0.05 });
  });
  it('refuses a fractional, negative or non-finite count', () => {
    expect(() => fringeOrderFromWholeCount(2.5)).toThrow(/whole fringe count/);
    expect(() => fringeOrderFromWholeCount(-1)).toThrow(/at least 0/);
    expect(() => fringeOrderFromWholeCount(Number.POSITIVE_INFINITY)).toThrow(/finite/);
  });
});
