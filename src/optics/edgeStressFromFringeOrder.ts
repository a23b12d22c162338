import type { Measured } from '../uncertainty/Measured.ts';
import { principalStressDifference } from './principalStressDifference.ts';

/**
 * Stress along a free, unloaded edge: there the stress normal to the edge is zero, so the
 * stress-optic law gives the tangential stress itself, σ = N·fσ/t, with the same GUM
 * propagation as principalStressDifference. Only valid on such an edge.
 *
 * @example
 * edgeStressFromFringeOrder({ value: 4.2, uncertainty: 0.02 }, { value: 10.8, uncertainty: 0.15 },
 *   { value: 6.35, uncertainty: 0.02 });
 * // { stressMPa: { value: 7.1433, uncertainty: 0.1073 } }
 */
export function edgeStressFromFringeOrder(
  fringeOrder: Measured,
  fringeValueNPerMm: Measured,
  thicknessMm: Measured,
): { stressMPa: Measured } {
  return { stressMPa: principalStressDifference(fringeOrder, fringeValueNPerMm, thicknessMm).stressDifferenceMPa };
}
