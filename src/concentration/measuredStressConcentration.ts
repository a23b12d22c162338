import { requireNumber } from '../guards/requireNumber.ts';
import { combinedStandardUncertainty } from '../uncertainty/combinedStandardUncertainty.ts';
import { isIndistinguishableFromZero } from '../uncertainty/isIndistinguishableFromZero.ts';
import { requireMeasured } from '../uncertainty/requireMeasured.ts';
import type { Measured } from '../uncertainty/Measured.ts';
import type { MeasuredKtWithNominalResult } from './MeasuredKtResult.ts';

/**
 * Measured stress concentration Kt = σ_root / σ_nom with σ_nom = P/(w_net·t), first-order
 * (GUM) uncertainty with the four inputs taken as independent. Undefined when the load cannot
 * be told from zero at k = 2. If σ_root came from the stress-optic law with this same t, its
 * u(t) and this one are correlated and t cancels; use measuredStressConcentrationFromOrder,
 * which avoids counting u(t) twice.
 *
 * @example
 * measuredStressConcentration({ value: 9.6, uncertainty: 0.15 }, { value: 800, uncertainty: 4 },
 *   { value: 30, uncertainty: 0.02 }, { value: 6, uncertainty: 0.02 });
 * // { defined: true, kt: { value: 2.16, uncertainty: 0.0362 }, nominalStressMPa: { value: 4.4444, uncertainty: 0.0269 } }
 */
export function measuredStressConcentration(
  rootStressMPa: Measured,
  loadN: Measured,
  netWidthMm: Measured,
  thicknessMm: Measured,
): MeasuredKtWithNominalResult {
  const s = requireMeasured('rootStressMPa', rootStressMPa);
  const p = requireMeasured('loadN', loadN);
  const w = requireMeasured('netWidthMm', netWidthMm, { above: 0 });
  const t = requireMeasured('thicknessMm', thicknessMm, { above: 0 });
  if (isIndistinguishableFromZero(p)) {
    return { defined: false, reason: `load ${p.value} ± ${p.uncertainty} N cannot be told from zero at k = 2` };
  }
  const area = w.value * t.value;
  const nominal = p.value / area;
  const kt = requireNumber('kt', s.value / nominal);
  return {
    defined: true,
    kt: {
      value: kt,
      uncertainty: combinedStandardUncertainty([
        { sensitivity: area / p.value, uncertainty: s.uncertainty },
        { sensitivity: -kt / p.value, uncertainty: p.uncertainty },
        { sensitivity: kt / w.value, uncertainty: w.uncertainty },
        { sensitivity: kt / t.value, uncertainty: t.uncertainty },
      ]),
    },
    nominalStressMPa: {
      value: nominal,
      uncertainty: combinedStandardUncertainty([
        { sensitivity: 1 / area, uncertainty: p.uncertainty },
        { sensitivity: -nominal / w.value, uncertainty: w.uncertainty },
        { sensitivity: -nominal / t.value, uncertainty: t.uncertainty },
      ]),
    },
  };
}
