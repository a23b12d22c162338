import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { fringeOrderFromTardy } from '../../../src/optics/fringeOrderFromTardy.ts';
import { tardyIntensity } from './support/jonesPolariscope.ts';

describe('fringeOrderFromTardy', () => {
  it('applies N = n + β/180 and N = (n+1) − β/180 [M: Tardy compensation]', () => {
    expect(fringeOrderFromTardy(2, 45, 'lower').fringeOrder.value).toBe(2.25);
    expect(fringeOrderFromTardy(2, 45, 'upper').fringeOrder.value).toBe(2.75);
    expect(fringeOrderFromTardy(0, 0, 'lower').fringeOrder.value).toBe(0);
    expect(fringeOrderFromTardy(3, 180, 'upper').fringeOrder.value).toBe(3);
  });

  it('puts extinction at the point in a Jones-calculus Tardy polariscope [C]', () => {
    for (const [n, beta] of [[0, 54], [1, 45], [4, 163.8]] as const) {
      const lower = fringeOrderFromTardy(n, beta, 'lower').fringeOrder.value;
      const upper = fringeOrderFromTardy(n, beta, 'upper').fringeOrder.value;
      // Rotating one way brings fringe n in, the other way fringe n+1.
      expect(tardyIntensity(lower, beta)).toBeLessThan(1e-20);
      expect(tardyIntensity(upper, -beta)).toBeLessThan(1e-20);
      expect(tardyIntensity(lower, 0)).toBeGreaterThan(0.01);
    }
  });

  it('defaults to ±0.02 fringe [M: Tardy ±0.01–0.02] and takes an explicit uncertainty', () => {
    expect(fringeOrderFromTardy(1, 90, 'lower').fringeOrder.uncertainty).toBe(0.02);
    expect(fringeOrderFromTardy(1, 90, 'lower', 0.01).fringeOrder.uncertainty).toBe(0.01);
    expect(fringeOrderFromTardy(1, 54, 'upper').formula).toBe('Tardy: N = (n + 1) − β/180 = 2 − 54/180 = 1.7');
  });

  it('refuses a fractional or negative lower order, β outside [0, 180] and an unknown moved fringe', () => {
    expect(() => fringeOrderFromTardy(1.5, 10, 'lower')).toThrow(/whole fringe count/);
    expect(() => fringeOrderFromTardy(-1, 10, 'lower')).toThrow(/at least 0/);
    expect(() => fringeOrderFromTardy(1, 180.5, 'lower')).toThrow(/at most 180/);
    expect(() => fringeOrderFromTardy(1, -1, 'upper')).toThrow(/at least 0/);
    expect(() => fringeOrderFromTardy(1, 10, 'middle' as 'lower')).toThrow(/movedFringe/);
    expect(() => fringeOrderFromTardy(1, 10, 'lower', -0.1)).toThrow(/uncertaintyFringes/);
  });

  it('always lies in [n, n+1] (property)', () => {
    fc.assert(
      fc.property(
        fc.nat({ max: 50 }),
        fc.double({ min: 0, max: 180, noNaN: true }),
        fc.constantFrom('lower' as const, 'upper' as const),
        (n, beta, moved) => {
          const v = fringeOrderFromTardy(n, beta, moved).fringeOrder.value;
          expect(v).toBeGreaterThanOrEqual(n);
          expect(v).toBeLessThanOrEqual(n + 1);
        },
      ),
    );
  });
});
