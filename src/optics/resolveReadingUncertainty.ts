import { requireNumber } from '../guards/requireNumber.ts';

/**
 * The standard uncertainty of a reading in fringes: the caller's explicit value when given
 * (validated ≥ 0), otherwise the method's default.
 *
 * @example
 * resolveReadingUncertainty(undefined, 0.02); // 0.02
 * resolveReadingUncertainty(0.05, 0.02);      // 0.05
 */
export function resolveReadingUncertainty(uncertaintyFringes: number | undefined, defaultFringes: number): number {
  if (uncertaintyFringes === undefined) return defaultFringes;
  return requireNumber('uncertaintyFringes', uncertaintyFringes, { min: 0 });
}
