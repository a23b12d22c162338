import { requireNumber } from '../guards/requireNumber.ts';
import { combinedStandardUncertainty } from '../uncertainty/combinedStandardUncertainty.ts';
import { requireMeasured } from '../uncertainty/requireMeasured.ts';
import type { Measured } from '../uncertainty/Measured.ts';

/**
 * Stress-optic law σ1 − σ2 = N·fσ/t (N/mm per fringe over mm gives MPa), with first-order
 * (GUM) uncertainty, inputs independent:
 * u(σ)² = (fσ/t·u(N))² + (N/t·u(fσ))² + (N·fσ/t²·u(t))².
 * N may be signed (a load-corrected order); the uncertainty does not depend on the sign.
 *
 * @example
 * principalStressDifference({ value: 2.5, uncertainty: 0.02 }, { value: 7.0, uncertainty: 0.2 },
 *   { value: 6.0, uncertainty: 0.05 });
 * // { stressDifferenceMPa: { value: 2.9167, uncertainty: 0.0899 } }
 */
export function principalStressDifference(
  fringeOrder: Measured,
  fringeValueNPerMm: Measured,
  thicknessMm: Measured,
): { stressDifferenceMPa: Measured } {
  const n = requireMeasured('fringeOrder', fringeOrder);
  const f = requireMeasured('fringeValueNPerMm', fringeValueNPerMm, { above: 0 });
  const t = requireMeasured('thicknessMm', thicknessMm, { above: 0 });
  const value = requireNumber('stressDifferenceMPa', (n.value * f.value) / t.value);
  const uncertainty = combinedStandardUncertainty([
    { sensitivity: f.value / t.value, uncertainty: n.uncertainty },
    { sensitivity: n.value / t.value, uncertainty: f.uncertainty },
    { sensitivity: -value / t.value, uncertainty: t.uncertainty },
  ]);
  return { stressDifferenceMPa: { value, uncertainty } };
}
