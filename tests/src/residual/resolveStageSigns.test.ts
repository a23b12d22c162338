import { describe, expect, it } from 'vitest';
import { resolveStageSigns } from '../../../src/residual/resolveStageSigns.ts';
import { DomainError } from '../../../src/errors/DomainError.ts';

const optics = { fringeValueNPerMm: { value: 7, uncertainty: 0.2 }, thicknessMm: { value: 6, uncertainty: 0.05 }, onFreeEdge: true };

describe('resolveStageSigns', () => {
  it('keeps measured signs and takes unsigned magnitudes as positive', () => {
    const r = resolveStageSigns({
      fabrication: { order: { value: 0.3, uncertainty: 0.02 }, signKnown: false },
      afterUnload: { order: { value: -0.2, uncertainty: 0.02 }, signKnown: true },
      ...optics,
    });
    expect(r).toEqual({
      fabrication: { order: { value: 0.3, uncertainty: 0.02 }, signAssumed: true },
      afterUnload: { order: { value: -0.2, uncertainty: 0.02 }, signAssumed: false },
    });
  });
  it('refuses a negative value on a reading without a measured sign', () => {
    expect(() =>
      resolveStageSigns({ beforeAnneal: { order: { value: -0.1, uncertainty: 0.01 }, signKnown: false }, ...optics }),
    ).toThrow(DomainError);
  });
  it('returns nothing for stages not read', () => {
    expect(resolveStageSigns({ ...optics })).toEqual({});
  });
});
