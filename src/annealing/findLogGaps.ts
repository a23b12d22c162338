import type { OvenLogFinding } from './OvenLogComparison.ts';

/**
 * Intervals between consecutive samples longer than `maxGapH`: what the oven did there is
 * unknown, so they are remarked on, with their start, end and length.
 *
 * @example
 * findLogGaps([0, 0.1, 0.2, 1.2, 1.3], 0.25);
 * // [{ kind: 'gap', severity: 'remark', atH: 0.2, untilH: 1.2, numbers: { gapH: 1 }, message: '...' }]
 */
export function findLogGaps(timesH: readonly number[], maxGapH: number): OvenLogFinding[] {
  const gaps: OvenLogFinding[] = [];
  for (let i = 1; i < timesH.length; i += 1) {
    const gapH = timesH[i]! - timesH[i - 1]!;
    if (gapH > maxGapH) {
      gaps.push({
        kind: 'gap',
        severity: 'remark',
        atH: timesH[i - 1]!,
        untilH: timesH[i]!,
        message: `No samples for ${gapH.toFixed(2)} h (from ${timesH[i - 1]!.toFixed(2)} h): the oven is unverified there.`,
        numbers: { gapH },
      });
    }
  }
  return gaps;
}
