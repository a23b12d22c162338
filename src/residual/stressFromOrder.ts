import { requireNumber } from '../guards/requireNumber.ts';
import { combinedStandardUncertainty } from '../uncertainty/combinedStandardUncertainty.ts';
import { requireMeasured } from '../uncertainty/requireMeasured.ts';
import type { Measured } from '../uncertainty/Measured.ts';
import type { StressFromOrder } from './SiteStagesTypes.ts';

/**
 * Stress-optic law σ1 − σ2 = N·fσ/t, with first-order (GUM) uncertainty from u(N), u(fσ),
 * u(t) taken as independent. fσ in N/mm per fringe over t in mm gives N/mm² = MPa. At a free
 * edge σ2 = 0, so the result is the edge stress itself; elsewhere it is only the principal
 * stress difference. Absolute sensitivities are used so that N = 0 still carries u(N).
 *
 * @example
 * stressFromOrder({ value: 2.5, uncertainty: 0.02 }, { value: 7.0, uncertainty: 0.2 },
 *   { value: 6.0, uncertainty: 0.05 }, true);
 * // { stressMPa: { value: 2.9167, uncertainty: 0.0899 }, kind: 'edge_stress' }
 */
export function stressFromOrder(
  order: Measured,
  fringeValueNPerMm: Measured,
  thicknessMm: Measured,
  onFreeEdge: boolean,
): StressFromOrder {
  const n = requireMeasured('order', order);
  const f = requireMeasured('fringeValueNPerMm', fringeValueNPerMm, { above: 0 });
  const t = requireMeasured('thicknessMm', thicknessMm, { above: 0 });
  const value = (n.value * f.value) / t.value;
  const uncertainty = combinedStandardUncertainty([
    { sensitivity: f.value / t.value, uncertainty: n.uncertainty },
    { sensitivity: n.value / t.value, uncertainty: f.uncertainty },
    { sensitivity: -value / t.value, uncertainty: t.uncertainty },
  ]);
  return {
    stressMPa: { value: requireNumber('stressMPa', value), uncertainty: requireNumber('stressMPa uncertainty', uncertainty) },
    kind: onFreeEdge ? 'edge_stress' : 'principal_stress_difference',
  };
}
