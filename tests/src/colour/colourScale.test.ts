import { describe, expect, it } from 'vitest';
import { colourScale } from '../../../src/colour/colourScale.ts';
import { colourAtRetardation } from '../../../src/colour/colourAtRetardation.ts';
import { DomainError } from '../../../src/errors/DomainError.ts';

describe('colourScale', () => {
  it('runs from black at 0 to maxFringes·577 nm with δ/577 beside each colour', () => {
    const scale = colourScale(3, 10, 'D65');
    expect(scale[0]).toEqual({ retardationNm: 0, fringeOrderAt577: 0, hex: '#000000' });
    expect(scale.at(-1)!.retardationNm).toBe(1730);
    expect(scale).toHaveLength(174);
    for (const step of scale) expect(step.fringeOrderAt577).toBeCloseTo(step.retardationNm / 577, 12);
  });
  it('uses the same colours as colourAtRetardation, for each illuminant', () => {
    const scale = colourScale(1, 144.25, 'A');
    expect(scale.map((s) => s.hex)).toEqual([0, 144.25, 288.5, 432.75, 577].map((d) => colourAtRetardation(d, 'A').srgbHex));
  });
  it('refuses a non-positive step, too many steps and absurd fringe counts', () => {
    expect(() => colourScale(3, 0)).toThrow(DomainError);
    expect(() => colourScale(3, 0.01)).toThrow(DomainError);
    expect(() => colourScale(-1)).toThrow(DomainError);
    expect(() => colourScale(100)).toThrow(DomainError);
  });
});
