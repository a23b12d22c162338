import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { fringeOrderFromSenarmont } from '../../../src/optics/fringeOrderFromSenarmont.ts';
import { senarmontIntensity } from './support/jonesPolariscope.ts';

describe('fringeOrderFromSenarmont', () => {
  it('applies δ/λ = β/180 on top of the whole orders [R: ASTM C148 method B, ASTM F218]', () => {
    const r = fringeOrderFromSenarmont(0, 36);
    expect(r.fringeOrder).toEqual({ value: 0.2, uncertainty: 0.02 });
    expect(r.formula).toBe('Sénarmont: N = n + β/180 = 0 + 36/180 = 0.2');
    expect(fringeOrderFromSenarmont(2, 90).fringeOrder.value).toBe(2.5);
  });

  it('gives λ/180 of retardation per degree of analyzer, ≈ 3.14 nm at 565 nm [C]', () => {
    expect(fringeOrderFromSenarmont(0, 1).fringeOrder.value * 565).toBeCloseTo(3.139, 3);
  });

  it('puts extinction at the analyzer angle in a Jones-calculus Sénarmont arrangement [C]', () => {
    fc.assert(
      fc.property(fc.nat({ max: 10 }), fc.double({ min: 0, max: 179.9, noNaN: true }), (n, beta) => {
        const order = fringeOrderFromSenarmont(n, beta).fringeOrder.value;
        expect(senarmontIntensity(order, beta)).toBeLessThan(1e-18);
      }),
    );
  });

  it('refuses a fractional whole order and β outside [0, 180]', () => {
    expect(() => fringeOrderFromSenarmont(0.5, 10)).toThrow(/whole fringe count/);
    expect(() => fringeOrderFromSenarmont(0, 200)).toThrow(/at most 180/);
    expect(() => fringeOrderFromSenarmont(0, Number.NaN)).toThrow(/finite/);
  });
});
