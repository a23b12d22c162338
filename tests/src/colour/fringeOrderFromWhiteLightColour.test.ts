import { describe, expect, it } from 'vitest';
import { fringeOrderFromWhiteLightColour } from '../../../src/colour/fringeOrderFromWhiteLightColour.ts';

describe('fringeOrderFromWhiteLightColour', () => {
  it('returns the best candidate as a Measured fringe order, with the method and model notes', () => {
    const r = fringeOrderFromWhiteLightColour({ colour: { namedColour: 'deep blue' } });
    expect(r.method).toBe('white-light-colour');
    expect(r.fringeOrder.value).toBeCloseTo(620 / 577, 12);
    expect(r.fringeOrder.uncertainty).toBeGreaterThan(0);
    expect(r.ambiguous).toBe(false);
    expect(r.referenceWavelengthNm).toBe(577);
    expect(r.notes.join(' ')).toContain('dispersion of birefringence neglected');
  });
  it('keeps every candidate and the reason when the colour recurs', () => {
    const r = fringeOrderFromWhiteLightColour({ colour: { namedColour: 'tint of passage' }, illuminant: 'A' });
    expect(r.ambiguous).toBe(true);
    expect(r.candidates.map((c) => c.fringeOrder.value)).toEqual([1, 1150 / 577]);
    expect(r.ambiguityReason).toContain("'purple, tint of passage' occurs in 2 orders");
  });
  it('reads a point of the illuminant A scale back to itself', () => {
    const r = fringeOrderFromWhiteLightColour({ colour: { retardationNm: 1050 }, illuminant: 'A', options: { thresholdDeltaE2000: 2 } });
    expect(r.retardationNm.value).toBe(1050);
    expect(r.candidates[0]!.deltaE2000).toBeLessThan(0.01);
  });
});
