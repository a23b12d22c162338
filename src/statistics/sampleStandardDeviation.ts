import { DomainError } from '../errors/DomainError.ts';
import { arithmeticMean } from './arithmeticMean.ts';

/**
 * Sample standard deviation with the n − 1 divisor (the same quantity as PostgreSQL's
 * `stddev_samp`). Two passes (mean first, then squared deviations) keep it accurate when the
 * spread is small next to the mean, as with fringe orders clustered near one value.
 *
 * @example
 * sampleStandardDeviation([2, 4, 4, 4, 5, 5, 7, 9]); // 2.138089935299395  (= √(32/7))
 */
export function sampleStandardDeviation(values: readonly number[], field = 'values'): number {
  if (values.length < 2) {
    throw new DomainError('invalid_input', `${field} needs at least two values for a sample standard deviation`, [
      { field, message: `needs at least 2 values, got ${values.length}` },
    ]);
  }
  const mean = arithmeticMean(values, field);
  let squares = 0;
  for (const v of values) squares += (v - mean) ** 2;
  return Math.sqrt(squares / (values.length - 1));
}
