import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { findLogGaps } from '../../../src/annealing/findLogGaps.ts';

describe('findLogGaps', () => {
  it('finds the one long interval, with its start, end and length [C]', () => {
    const gaps = findLogGaps([0, 0.1, 0.2, 1.2, 1.3], 0.25);
    expect(gaps).toHaveLength(1);
    expect(gaps[0]).toMatchObject({ kind: 'gap', severity: 'remark', atH: 0.2, untilH: 1.2 });
    expect(gaps[0]!.numbers.gapH).toBeCloseTo(1, 12);
    expect(gaps[0]!.message).toBe('No samples for 1.00 h (from 0.20 h): the oven is unverified there.');
  });

  it('does not count an interval exactly at the limit, and counts one just above it', () => {
    expect(findLogGaps([0, 0.25, 0.5, 0.75], 0.25)).toEqual([]);
    expect(findLogGaps([0, 0.25, 0.5 + 2 ** -20], 0.25).map((g) => g.atH)).toEqual([0.25]);
  });

  it('finds nothing in an empty log, a single sample, or repeated time stamps', () => {
    expect(findLogGaps([], 0.25)).toEqual([]);
    expect(findLogGaps([3], 0.25)).toEqual([]);
    expect(findLogGaps([1, 1, 1], 0)).toEqual([]);
  });

  it('lists several gaps in time order', () => {
    expect(findLogGaps([0, 1, 1.125, 3, 3.0625], 0.5).map((g) => [g.atH, g.untilH, g.numbers.gapH])).toEqual([
      [0, 1, 1],
      [1.125, 3, 1.875],
    ]);
  });

  it('reports exactly the intervals longer than the limit (fast-check)', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: 0, max: 2, noNaN: true }), { maxLength: 60 }), fc.double({ min: 0, max: 1, noNaN: true }), (steps, maxGapH) => {
        const times = steps.reduce<number[]>((acc, s) => [...acc, (acc[acc.length - 1] ?? 0) + s], []);
        const gaps = findLogGaps(times, maxGapH);
        const expected = times.slice(1).filter((t, i) => t - times[i]! > maxGapH).length;
        expect(gaps).toHaveLength(expected);
        for (const g of gaps) {
          expect(g.untilH! - g.atH).toBe(g.numbers.gapH);
          expect(g.numbers.gapH).toBeGreaterThan(maxGapH);
        }
      }),
    );
  });
});
