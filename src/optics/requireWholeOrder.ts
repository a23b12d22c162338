import { DomainError } from '../errors/DomainError.ts';
import { requireNumber } from '../guards/requireNumber.ts';

/**
 * Returns `value` when it is a whole fringe count (an integer ≥ 0), else throws an
 * `invalid_input` DomainError naming the field.
 *
 * @example
 * requireWholeOrder('lowerOrder', 2);   // 2
 * requireWholeOrder('lowerOrder', 2.5); // throws DomainError('invalid_input')
 */
export function requireWholeOrder(field: string, value: number): number {
  requireNumber(field, value, { min: 0 });
  if (!Number.isInteger(value)) {
    throw new DomainError('invalid_input', `${field} must be a whole fringe count, got ${value}`, [
      { field, message: `must be an integer ≥ 0, got ${value}` },
    ]);
  }
  return value;
}
