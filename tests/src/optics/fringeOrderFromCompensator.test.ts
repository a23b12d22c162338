import { describe, expect, it } from 'vitest';
import { fringeOrderFromCompensator } from '../../../src/optics/fringeOrderFromCompensator.ts';

describe('fringeOrderFromCompensator', () => {
  it('applies N = δ/λ [R: ASTM D4093]', () => {
    expect(fringeOrderFromCompensator(288.5, 577).fringeOrder.value).toBe(0.5);
    expect(fringeOrderFromCompensator(1154, 577).fringeOrder.value).toBe(2);
    expect(fringeOrderFromCompensator(0, 589.3).fringeOrder.value).toBe(0);
  });

  it('takes its default uncertainty from a 5 nm resolution as r/√12 [M: GUM 4.3.7; resolution common practice]', () => {
    expect(fringeOrderFromCompensator(100, 577).fringeOrder.uncertainty).toBeCloseTo(1.4434 / 577, 7);
    expect(fringeOrderFromCompensator(100, 577, 0.01).fringeOrder.uncertainty).toBe(0.01);
  });

  it('refuses negative retardation', () => {
    expect(() => fringeOrderFromCompensator(-1, 577)).toThrow(/retardationNm/);
  });
});
