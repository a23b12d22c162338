import { DomainError } from '../errors/DomainError.ts';
import { requireNumber } from '../guards/requireNumber.ts';

/**
 * Arithmetic mean of a non-empty list of finite numbers.
 *
 * @example
 * arithmeticMean([0.12, 0.18, 0.15]); // 0.15
 */
export function arithmeticMean(values: readonly number[], field = 'values'): number {
  if (values.length === 0) {
    throw new DomainError('invalid_input', `${field} must not be empty`, [
      { field, message: 'needs at least one value' },
    ]);
  }
  let sum = 0;
  values.forEach((v, i) => {
    sum += requireNumber(`${field}[${i}]`, v);
  });
  return sum / values.length;
}
