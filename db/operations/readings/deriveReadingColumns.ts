import { fringeOrderFromReading } from '../../../src/optics/fringeOrderFromReading.ts';
import type { CreateReadingInput } from '../../inputs/readings.ts';

/**
 * The stored columns of a reading: its raw inputs as given, and the fringe order, its
 * uncertainty and the retardation derived from them by the domain core.
 */
export function deriveReadingColumns(input: CreateReadingInput) {
  const derived = fringeOrderFromReading(input.reading, { wavelengthNm: input.wavelengthNm }, input.uncertaintyFringes);
  return {
    stage: input.stage,
    loadN: input.loadN ?? null,
    observedAt: new Date(input.observedAt),
    operator: input.operator,
    wavelengthNm: input.wavelengthNm,
    method: input.reading.method,
    rawInputs: { ...input.reading, ...(input.uncertaintyFringes !== undefined ? { uncertaintyFringes: input.uncertaintyFringes } : {}) },
    sign: input.sign,
    fringeOrder: derived.fringeOrder.value,
    fringeOrderUncertainty: derived.fringeOrder.uncertainty,
    retardationNm: derived.retardationNm.value,
    notes: input.notes ?? null,
  };
}
