import { edgeStressFromFringeOrder } from '../../src/optics/edgeStressFromFringeOrder.ts';
import { fringeValueAtWavelength } from '../../src/optics/fringeValueAtWavelength.ts';
import { principalStressDifference } from '../../src/optics/principalStressDifference.ts';
import { resolveWavelengthNm } from '../../src/optics/resolveWavelengthNm.ts';
import type { StressKind } from '../../src/residual/SiteStagesTypes.ts';
import type { Measured } from '../../src/uncertainty/Measured.ts';
import type { EdgeStressCalcInput } from '../schemas/calcSchemas.ts';

export interface EdgeStressCalcResult {
  stressMPa: Measured;
  kind: StressKind;
  /** The fσ actually used, after any wavelength conversion. */
  fringeValueNPerMm: Measured;
  /** Wavelength fσ refers to; null when no wavelength was given and fσ was used as quoted. */
  wavelengthNm: number | null;
  formula: string;
  notes: string[];
}

/**
 * POST /v1/calc/edge-stress: the stress-optic law N·fσ/t with GUM propagation, after
 * converting fσ to the reading's wavelength when both wavelengths are given.
 *
 * @example
 * calculateEdgeStress({ fringeOrder: { value: 1.5, uncertainty: 0.02 }, fringeValueNPerMm: { value: 10, uncertainty: 0.3 },
 *   thicknessMm: { value: 5, uncertainty: 0.02 }, onFreeEdge: true });
 * // stressMPa { value: 3.0, uncertainty: 0.09922 }, kind 'edge_stress', wavelengthNm null
 */
export function calculateEdgeStress(input: EdgeStressCalcInput): EdgeStressCalcResult {
  const notes: string[] = [];
  const quotedAt = input.fringeValueNPerMm.quotedAtWavelengthNm;
  let fringeValue: Measured = { value: input.fringeValueNPerMm.value, uncertainty: input.fringeValueNPerMm.uncertainty };
  let wavelengthNm: number | null = null;
  if (quotedAt !== undefined && input.readingWavelengthNm !== undefined) {
    const converted = fringeValueAtWavelength(fringeValue, quotedAt, resolveWavelengthNm({ wavelengthNm: input.readingWavelengthNm }));
    fringeValue = converted.fringeValueNPerMm;
    wavelengthNm = converted.wavelengthNm;
    notes.push(`fringe value ${converted.note}`);
  }
  const stressMPa = input.onFreeEdge
    ? edgeStressFromFringeOrder(input.fringeOrder, fringeValue, input.thicknessMm).stressMPa
    : principalStressDifference(input.fringeOrder, fringeValue, input.thicknessMm).stressDifferenceMPa;
  notes.push(
    input.onFreeEdge
      ? 'free, unloaded edge: the normal stress is zero, so N·fσ/t is the tangential stress itself (sign as the order given)'
      : 'away from a free edge the stress-optic law gives only σ1 − σ2, not either stress',
    'standard uncertainty (k = 1), first-order propagation of u(N), u(fσ), u(t) taken as independent',
  );
  return {
    stressMPa,
    kind: input.onFreeEdge ? 'edge_stress' : 'principal_stress_difference',
    fringeValueNPerMm: fringeValue,
    wavelengthNm,
    formula: input.onFreeEdge ? 'σ = N·fσ/t' : 'σ1 − σ2 = N·fσ/t',
    notes,
  };
}
