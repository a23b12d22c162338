import { DomainError } from '../errors/DomainError.ts';
import { requireNumber } from '../guards/requireNumber.ts';
import { requireMeasured } from './requireMeasured.ts';
import type { Measured } from './Measured.ts';

/** One factor xᵢ of a power product and its exponent pᵢ. */
export interface PowerFactor {
  field: string;
  measured: Measured;
  exponent: number;
}

/**
 * y = c·Π xᵢ^pᵢ with first-order (GUM 5.1.6) uncertainty for independent factors:
 * (u(y)/|y|)² = Σ (pᵢ·u(xᵢ)/xᵢ)². Every factor value must be non-zero (the relative form
 * divides by it); the caller decides what a zero means before calling.
 *
 * @example
 * // disk calibration fσ = (8/π)·P·D⁻¹·N⁻¹ with P = 1200 ± 6 N, D = 50 ± 0.02 mm, N = 5.5 ± 0.02
 * propagatePowerProduct(8 / Math.PI, [
 *   { field: 'loadN', measured: { value: 1200, uncertainty: 6 }, exponent: 1 },
 *   { field: 'diameterMm', measured: { value: 50, uncertainty: 0.02 }, exponent: -1 },
 *   { field: 'fringeOrder', measured: { value: 5.5, uncertainty: 0.02 }, exponent: -1 },
 * ]); // { value: 11.112, uncertainty: 0.0688 }
 */
export function propagatePowerProduct(constant: number, factors: readonly PowerFactor[]): Measured {
  requireNumber('constant', constant);
  let value = constant;
  let relativeSquared = 0;
  for (const { field, measured, exponent } of factors) {
    const x = requireMeasured(field, measured);
    requireNumber(`${field}.exponent`, exponent);
    if (x.value === 0) {
      throw new DomainError('invalid_input', `${field} must not be zero in a power product`, [
        { field: `${field}.value`, message: 'must not be zero' },
      ]);
    }
    value *= x.value ** exponent;
    relativeSquared += ((exponent * x.uncertainty) / x.value) ** 2;
  }
  requireNumber('result', value);
  return { value, uncertainty: Math.abs(value) * Math.sqrt(relativeSquared) };
}
