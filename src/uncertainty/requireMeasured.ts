import { DomainError } from '../errors/DomainError.ts';
import { requireNumber } from '../guards/requireNumber.ts';
import type { NumberBounds } from '../guards/requireNumber.ts';
import type { Measured } from './Measured.ts';

/**
 * Returns `measured` when its value is finite (and inside `valueBounds`) and its standard
 * uncertainty is finite and not negative; otherwise throws an `invalid_input` DomainError
 * naming `field.value` or `field.uncertainty`.
 *
 * @example
 * requireMeasured('thicknessMm', { value: 6.0, uncertainty: 0.05 }, { above: 0 });
 * // { value: 6, uncertainty: 0.05 }
 * requireMeasured('thicknessMm', { value: 6.0, uncertainty: -1 }); // throws DomainError('invalid_input')
 */
export function requireMeasured(field: string, measured: Measured, valueBounds: NumberBounds = {}): Measured {
  if (typeof measured !== 'object' || measured === null) {
    throw new DomainError('invalid_input', `${field} must be { value, uncertainty }`, [
      { field, message: 'must be an object with value and uncertainty' },
    ]);
  }
  const value = requireNumber(`${field}.value`, measured.value, valueBounds);
  const uncertainty = requireNumber(`${field}.uncertainty`, measured.uncertainty, { min: 0 });
  return { value, uncertainty };
}
