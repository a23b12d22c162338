import { combinedStandardUncertainty } from '../uncertainty/combinedStandardUncertainty.ts';
import { requireMeasured } from '../uncertainty/requireMeasured.ts';
import type { Measured } from '../uncertainty/Measured.ts';

/**
 * Strain fringe value fε = fσ(1 + ν)/E, from Hooke's law in the plane
 * (σ1 − σ2 = E(ε1 − ε2)/(1 + ν)), so ε1 − ε2 = N·fε/t. fσ in N/mm per fringe over E in
 * N/mm² (MPa) gives mm per fringe. First-order (GUM) uncertainty, inputs independent.
 *
 * @example
 * strainFringeValue({ value: 7.0, uncertainty: 0.2 }, { value: 2400, uncertainty: 100 },
 *   { value: 0.37, uncertainty: 0.01 });
 * // { strainFringeValueMmPerFringe: { value: 0.003996, uncertainty: 0.000204 } }
 */
export function strainFringeValue(
  fringeValueNPerMm: Measured,
  youngsModulusMPa: Measured,
  poissonRatio: Measured,
): { strainFringeValueMmPerFringe: Measured } {
  const f = requireMeasured('fringeValueNPerMm', fringeValueNPerMm, { above: 0 });
  const e = requireMeasured('youngsModulusMPa', youngsModulusMPa, { above: 0 });
  const nu = requireMeasured('poissonRatio', poissonRatio, { above: -1, max: 0.5 });
  const value = (f.value * (1 + nu.value)) / e.value;
  const uncertainty = combinedStandardUncertainty([
    { sensitivity: (1 + nu.value) / e.value, uncertainty: f.uncertainty },
    { sensitivity: -value / e.value, uncertainty: e.uncertainty },
    { sensitivity: f.value / e.value, uncertainty: nu.uncertainty },
  ]);
  return { strainFringeValueMmPerFringe: { value, uncertainty } };
}
