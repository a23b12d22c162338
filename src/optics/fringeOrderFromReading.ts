import { DomainError } from '../errors/DomainError.ts';
import type { Measured } from '../uncertainty/Measured.ts';
import { fringeOrderFromColourReading } from './fringeOrderFromColourReading.ts';
import { fringeOrderFromCompensator } from './fringeOrderFromCompensator.ts';
import { fringeOrderFromDirect } from './fringeOrderFromDirect.ts';
import { fringeOrderFromSenarmont } from './fringeOrderFromSenarmont.ts';
import { fringeOrderFromTardy } from './fringeOrderFromTardy.ts';
import { fringeOrderFromWholeCount } from './fringeOrderFromWholeCount.ts';
import type { LightInput, MethodFringeOrder, ReadingMethodInput } from './ReadingMethodInput.ts';
import { resolveWavelengthNm } from './resolveWavelengthNm.ts';
import { retardationFromFringeOrder } from './retardationFromFringeOrder.ts';

export interface FringeOrderFromReading {
  /** Unsigned fringe order with its standard uncertainty (fringes). */
  fringeOrder: Measured;
  formula: string;
  retardationNm: Measured;
  /** The wavelength the order refers to (577 nm for white light). */
  wavelengthNm: number;
}

/**
 * Turns a reading made by any of the supported methods into a fringe order, its retardation
 * δ = N·λ, and the formula used. `uncertaintyFringes` overrides the method's default reading
 * uncertainty (see readingDefaults.ts for each default and its flag).
 *
 * @example
 * fringeOrderFromReading(
 *   { method: 'tardy', lowerOrder: 1, analyzerRotationDeg: 54, movedFringe: 'upper' },
 *   { wavelengthNm: null },
 * );
 * // { fringeOrder: { value: 1.7, uncertainty: 0.02 },
 * //   formula: 'Tardy: N = (n + 1) − β/180 = 2 − 54/180 = 1.7',
 * //   retardationNm: { value: 980.9, uncertainty: 11.54 }, wavelengthNm: 577 }
 */
export function fringeOrderFromReading(
  reading: ReadingMethodInput,
  light: LightInput,
  uncertaintyFringes?: number,
): FringeOrderFromReading {
  const wavelengthNm = resolveWavelengthNm(light);
  if (reading.method === 'white_light_colour') {
    // The colour match yields the retardation itself, so it is kept rather than recomputed from N.
    const { fringeOrder, formula, retardationNm } = fringeOrderFromColourReading(reading, wavelengthNm, uncertaintyFringes);
    return { fringeOrder, formula, retardationNm, wavelengthNm };
  }
  const { fringeOrder, formula } = orderForMethod(reading, wavelengthNm, uncertaintyFringes);
  const { retardationNm } =
    reading.method === 'compensator'
      ? { retardationNm: { value: reading.retardationNm, uncertainty: fringeOrder.uncertainty * wavelengthNm } }
      : retardationFromFringeOrder(fringeOrder, wavelengthNm);
  return { fringeOrder, formula, retardationNm, wavelengthNm };
}

function orderForMethod(reading: Exclude<ReadingMethodInput, { method: 'white_light_colour' }>, wavelengthNm: number, u: number | undefined): MethodFringeOrder {
  switch (reading.method) {
    case 'whole_order':
      return fringeOrderFromWholeCount(reading.wholeOrder, u);
    case 'tardy':
      return fringeOrderFromTardy(reading.lowerOrder, reading.analyzerRotationDeg, reading.movedFringe, u);
    case 'senarmont':
      return fringeOrderFromSenarmont(reading.wholeOrder, reading.analyzerRotationDeg, u);
    case 'compensator':
      return fringeOrderFromCompensator(reading.retardationNm, wavelengthNm, u);
    case 'direct':
      return fringeOrderFromDirect(reading.fringeOrder, u);
    default: {
      // Reachable from untyped callers (JSON); the compiler proves every known method is handled.
      const unknown: { method?: unknown } = reading;
      throw new DomainError('invalid_input', `unknown reading method ${String(unknown.method)}`, [
        { field: 'method', message: `must be one of whole_order, tardy, senarmont, compensator, direct, white_light_colour` },
      ]);
    }
  }
}
