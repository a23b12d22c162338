import { DomainError } from '../errors/DomainError.ts';
import { requireNumber } from '../guards/requireNumber.ts';

/**
 * The p-quantile of ascending `sortedValues` by linear interpolation between the closest
 * ranks: position h = (n − 1)·p (0-based), result x[⌊h⌋] + (h − ⌊h⌋)·(x[⌊h⌋+1] − x[⌊h⌋]).
 * This is the definition PostgreSQL's `percentile_cont` uses (Hyndman–Fan type 7), so it
 * cross-checks SQL answers. Unsorted input is refused, not silently sorted, so a caller that
 * forgot to sort learns of it.
 *
 * @example
 * percentileLinear([0.05, 0.08, 0.1, 0.2], 0.5);  // 0.09
 * percentileLinear([0.05, 0.08, 0.1, 0.2], 0.9);  // 0.17000000000000004  (h = 2.7)
 */
export function percentileLinear(sortedValues: readonly number[], p: number): number {
  requireNumber('p', p, { min: 0, max: 1 });
  const n = sortedValues.length;
  if (n === 0) {
    throw new DomainError('invalid_input', 'sortedValues must not be empty', [
      { field: 'sortedValues', message: 'needs at least one value' },
    ]);
  }
  sortedValues.forEach((v, i) => {
    requireNumber(`sortedValues[${i}]`, v);
    if (i > 0 && v < (sortedValues[i - 1] as number)) {
      throw new DomainError('invalid_input', 'sortedValues must be in ascending order', [
        { field: `sortedValues[${i}]`, message: `${v} follows the larger ${String(sortedValues[i - 1])}` },
      ]);
    }
  });
  const h = (n - 1) * p;
  const lower = Math.floor(h);
  const below = sortedValues[lower] as number;
  if (lower === n - 1) return below;
  return below + (h - lower) * ((sortedValues[lower + 1] as number) - below);
}
