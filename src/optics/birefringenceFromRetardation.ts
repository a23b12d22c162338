import { combinedStandardUncertainty } from '../uncertainty/combinedStandardUncertainty.ts';
import { requireMeasured } from '../uncertainty/requireMeasured.ts';
import type { Measured } from '../uncertainty/Measured.ts';

/**
 * Birefringence Δn = n1 − n2 = δ/t [R: ASTM D4093], dimensionless; δ in nm over t in mm
 * carries a factor 1e-6. First-order (GUM) uncertainty from u(δ) and u(t), independent.
 *
 * @example
 * birefringenceFromRetardation({ value: 120, uncertainty: 2 }, { value: 6, uncertainty: 0.05 });
 * // { birefringence: { value: 2.0e-5, uncertainty: 3.7e-7 } }
 */
export function birefringenceFromRetardation(retardationNm: Measured, thicknessMm: Measured): { birefringence: Measured } {
  const delta = requireMeasured('retardationNm', retardationNm);
  const t = requireMeasured('thicknessMm', thicknessMm, { above: 0 });
  const value = (delta.value * 1e-6) / t.value;
  const uncertainty = combinedStandardUncertainty([
    { sensitivity: 1e-6 / t.value, uncertainty: delta.uncertainty },
    { sensitivity: -value / t.value, uncertainty: t.uncertainty },
  ]);
  return { birefringence: { value, uncertainty } };
}
