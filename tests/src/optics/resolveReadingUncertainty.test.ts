import { describe, expect, it } from 'vitest';
import { resolveReadingUncertainty } from '../../../src/optics/resolveReadingUncertainty.ts';

describe('resolveReadingUncertainty', () => {
  it('prefers an explicit value, falls back to the default, refuses a negative one', () => {
    expect(resolveReadingUncertainty(undefined, 0.02)).toBe(0.02);
    expect(resolveReadingUncertainty(0, 0.02)).toBe(0);
    expect(resolveReadingUncertainty(0.3, 0.02)).toBe(0.3);
    expect(() => resolveReadingUncertainty(-0.01, 0.02)).toThrow(/uncertaintyFringes/);
  });
});
