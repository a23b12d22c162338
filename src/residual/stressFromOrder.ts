import { requireNumber } from '../guards/requireNumber.ts';
import { principalStressDifference } from '../optics/principalStressDifference.ts';
import type { Measured } from '../uncertainty/Measured.ts';
import type { StressFromOrder } from './SiteStagesTypes.ts';

/**
 * The stress-optic law (src/optics/principalStressDifference) labelled for a site: at a free
 * edge σ2 = 0, so N·fσ/t is the edge stress itself; elsewhere only the principal stress
 * difference. An uncertainty that overflows is refused, like the value.
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
  const { stressDifferenceMPa } = principalStressDifference(order, fringeValueNPerMm, thicknessMm);
  return {
    stressMPa: { value: stressDifferenceMPa.value, uncertainty: requireNumber('stressMPa uncertainty', stressDifferenceMPa.uncertainty) },
    kind: onFreeEdge ? 'edge_stress' : 'principal_stress_difference',
  };
}
