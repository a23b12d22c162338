import { fringeOrderFromReading, type FringeOrderFromReading } from '../../src/optics/fringeOrderFromReading.ts';
import type { FringeOrderCalcInput } from '../schemas/calcSchemas.ts';

export interface FringeOrderCalcResult extends FringeOrderFromReading {
  light: 'monochromatic' | 'white_light';
  uncertaintySource: 'given' | 'method_default';
  notes: string[];
}

/**
 * POST /v1/calc/fringe-order: one reading's raw inputs to its fringe order and retardation,
 * saying which light and which reading uncertainty the answer rests on.
 *
 * @example
 * calculateFringeOrder({ reading: { method: 'tardy', lowerOrder: 2, analyzerRotationDeg: 63, movedFringe: 'lower' }, wavelengthNm: 546.1 });
 * // fringeOrder { value: 2.35, uncertainty: 0.02 }, retardationNm { value: 1283.335, uncertainty: 10.922 },
 * // wavelengthNm 546.1, light 'monochromatic', uncertaintySource 'method_default'
 */
export function calculateFringeOrder(input: FringeOrderCalcInput): FringeOrderCalcResult {
  const result = fringeOrderFromReading(input.reading, { wavelengthNm: input.wavelengthNm }, input.uncertaintyFringes);
  const light = input.wavelengthNm === null ? 'white_light' : 'monochromatic';
  const uncertaintySource = input.uncertaintyFringes === undefined ? 'method_default' : 'given';
  const notes = [
    ...(light === 'white_light' ? [`white light: the order refers to ${result.wavelengthNm} nm, the effective wavelength at the tint of passage`] : []),
    ...(uncertaintySource === 'method_default' ? ["reading uncertainty is the method's default; a lab's own repeatability study should replace it"] : []),
    'the order is a magnitude; its sign along the boundary is settled separately (compensation or a known load)',
  ];
  return { ...result, light, uncertaintySource, notes };
}
