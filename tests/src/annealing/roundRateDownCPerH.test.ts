import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { roundRateDownCPerH } from '../../../src/annealing/roundRateDownCPerH.ts';

describe('roundRateDownCPerH', () => {
  it('keeps keyable values and rounds others down', () => {
    expect(roundRateDownCPerH(4.9)).toBe(4.9);
    expect(roundRateDownCPerH(10.333)).toBe(10.3);
    expect(roundRateDownCPerH(0.4567)).toBe(0.45);
  });

  it('never rounds up and loses less than one step (fast-check)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.01, max: 5000, noNaN: true }), (r) => {
        const d = roundRateDownCPerH(r);
        expect(d).toBeLessThanOrEqual(r + 1e-9);
        expect(r - d).toBeLessThan(r >= 1 ? 0.1 + 1e-9 : 0.01 + 1e-9);
      }),
    );
  });
});
