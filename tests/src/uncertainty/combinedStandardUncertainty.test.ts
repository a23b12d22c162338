import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { combinedStandardUncertainty } from '../../../src/uncertainty/combinedStandardUncertainty.ts';
import { monteCarlo } from './support/monteCarlo.ts';

describe('combinedStandardUncertainty', () => {
  it('root-sum-squares 3 and 4 into 5 [C]', () => {
    expect(combinedStandardUncertainty([{ sensitivity: 1, uncertainty: 3 }, { sensitivity: -2, uncertainty: 2 }])).toBe(5);
  });
  it('is zero for no contributions', () => {
    expect(combinedStandardUncertainty([])).toBe(0);
  });
  it('matches an independent Monte Carlo for a linear combination 2a − 3b + c [GUM eq. 10, M]', () => {
    const a = { value: 1, uncertainty: 0.1 };
    const b = { value: 2, uncertainty: 0.05 };
    const c = { value: -1, uncertainty: 0.2 };
    const mc = monteCarlo([a, b, c], (x, y, z) => 2 * x - 3 * y + z);
    const u = combinedStandardUncertainty([
      { sensitivity: 2, uncertainty: 0.1 },
      { sensitivity: -3, uncertainty: 0.05 },
      { sensitivity: 1, uncertainty: 0.2 },
    ]);
    expect(Math.abs(mc.uncertainty / u - 1)).toBeLessThan(0.01);
  });
  it('never falls below the largest single contribution (property)', () => {
    fc.assert(
      fc.property(fc.array(fc.record({ sensitivity: fc.double({ min: -1e3, max: 1e3, noNaN: true }), uncertainty: fc.double({ min: 0, max: 1e3, noNaN: true }) }), { minLength: 1, maxLength: 6 }), (terms) => {
        const u = combinedStandardUncertainty(terms);
        const largest = Math.max(...terms.map((t) => Math.abs(t.sensitivity * t.uncertainty)));
        expect(u).toBeGreaterThanOrEqual(largest * (1 - 1e-12));
      }),
    );
  });
});
