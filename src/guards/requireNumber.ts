import { DomainError } from '../errors/DomainError.ts';

export interface NumberBounds {
  /** Inclusive lower bound. */
  min?: number;
  /** Inclusive upper bound. */
  max?: number;
  /** Exclusive lower bound, e.g. 0 for quantities that must be positive. */
  above?: number;
}

/**
 * Returns `value` when it is a finite number inside the bounds, else throws an
 * `invalid_input` DomainError naming the field, so no NaN or Infinity leaks into a result.
 *
 * @example
 * requireNumber('thicknessMm', 6.2, { above: 0 }); // 6.2
 * requireNumber('thicknessMm', 0, { above: 0 });   // throws DomainError('invalid_input')
 */
export function requireNumber(field: string, value: number, bounds: NumberBounds = {}): number {
  const fail = (why: string): never => {
    throw new DomainError('invalid_input', `${field} ${why}`, [{ field, message: why }]);
  };
  if (typeof value !== 'number' || !Number.isFinite(value)) fail(`must be a finite number, got ${String(value)}`);
  if (bounds.above !== undefined && !(value > bounds.above)) fail(`must be greater than ${bounds.above}, got ${value}`);
  if (bounds.min !== undefined && value < bounds.min) fail(`must be at least ${bounds.min}, got ${value}`);
  if (bounds.max !== undefined && value > bounds.max) fail(`must be at most ${bounds.max}, got ${value}`);
  return value;
}
