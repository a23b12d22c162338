import { describe, expect, it } from 'vitest';
import { fringeOrderFromDirect } from '../../../src/optics/fringeOrderFromDirect.ts';

describe('fringeOrderFromDirect', () => {
  it('keeps the order read and defaults to ±0.2 fringe [M: colour by eye ±0.1–0.2]', () => {
    expect(fringeOrderFromDirect(0.79)).toEqual({ fringeOrder: { value: 0.79, uncertainty: 0.2 }, formula: 'direct reading: N = 0.79' });
  });
  it('takes the method’s own uncertainty, e.g. ±0.05 for an intensity method [R: Sarma et al.]', () => {
    expect(fringeOrderFromDirect(0.79, 0.05).fringeOrder.uncertainty).toBe(0.05);
  });
  it('refuses a negative order (orders here are magnitudes)', () => {
    expect(() => fringeOrderFromDirect(-0.2)).toThrow(/at least 0/);
  });
});
