import { requireNumber } from '../guards/requireNumber.ts';
import { combinedStandardUncertainty } from '../uncertainty/combinedStandardUncertainty.ts';
import { isIndistinguishableFromZero } from '../uncertainty/isIndistinguishableFromZero.ts';
import { requireMeasured } from '../uncertainty/requireMeasured.ts';
import type { Measured } from '../uncertainty/Measured.ts';
import type { MeasuredKtResult } from './MeasuredKtResult.ts';

/**
 * Measured Kt straight from the notch-root fringe order: σ_root = N·fσ/t and
 * σ_nom = P/(w_net·t), so Kt = N·fσ·w_net/P and the thickness cancels — with it the
 * correlation a separate σ_root would carry. Pass the load-corrected order (N_load − N_fab).
 * The nominal stress is not returned here because it needs t; GUM propagation of u(N),
 * u(fσ), u(w), u(P). Undefined when the load cannot be told from zero at k = 2.
 *
 * @example
 * measuredStressConcentrationFromOrder({ value: 5.4, uncertainty: 0.02 }, { value: 10.8, uncertainty: 0.15 },
 *   { value: 800, uncertainty: 4 }, { value: 30, uncertainty: 0.02 });
 * // { defined: true, kt: { value: 2.187, uncertainty: 0.0333 } }
 */
export function measuredStressConcentrationFromOrder(
  fringeOrder: Measured,
  fringeValueNPerMm: Measured,
  loadN: Measured,
  netWidthMm: Measured,
): MeasuredKtResult {
  const n = requireMeasured('fringeOrder', fringeOrder);
  const f = requireMeasured('fringeValueNPerMm', fringeValueNPerMm, { above: 0 });
  const p = requireMeasured('loadN', loadN);
  const w = requireMeasured('netWidthMm', netWidthMm, { above: 0 });
  if (isIndistinguishableFromZero(p)) {
    return { defined: false, reason: `load ${p.value} ± ${p.uncertainty} N cannot be told from zero at k = 2` };
  }
  const kt = requireNumber('kt', (n.value * f.value * w.value) / p.value);
  const uncertainty = combinedStandardUncertainty([
    { sensitivity: (f.value * w.value) / p.value, uncertainty: n.uncertainty },
    { sensitivity: (n.value * w.value) / p.value, uncertainty: f.uncertainty },
    { sensitivity: (n.value * f.value) / p.value, uncertainty: w.uncertainty },
    { sensitivity: -kt / p.value, uncertainty: p.uncertainty },
  ]);
  return { defined: true, kt: { value: kt, uncertainty } };
}
