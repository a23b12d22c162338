import type { ExportedReading } from './exportReadings.ts';

/**
 * A reading as an import reads it (CreateReadingInput plus model code and site label), with
 * the stored and derived fields beside it. Absent optional inputs are left out, not null, so
 * the object passes the import's schema unchanged.
 *
 * @example
 * exportJsonReading(row)
 * // { id: '…', modelCode: 'UN-07', siteLabel: 'upper notch root', stage: 'before_load',
 * //   observedAt: '2026-11-21T14:05:00.000Z', operator: 'R. Okafor', wavelengthNm: 577,
 * //   reading: { method: 'whole_order', wholeOrder: 2 }, sign: 'unknown', fringeOrder: 2,
 * //   fringeOrderUncertainty: 0.05, retardationNm: 1154, supersedesId: null, amendmentReason: null,
 * //   recordedAt: '2026-11-22T08:00:00.000Z' }
 */
export function exportJsonReading(r: ExportedReading): Record<string, unknown> {
  const { uncertaintyFringes, ...reading } = r.rawInputs;
  return {
    id: r.id,
    modelCode: r.modelCode,
    siteLabel: r.siteLabel,
    stage: r.stage,
    ...(r.loadN === null ? {} : { loadN: r.loadN }),
    observedAt: r.observedAt.toISOString(),
    operator: r.operator,
    wavelengthNm: r.wavelengthNm,
    reading,
    sign: r.sign,
    ...(uncertaintyFringes === undefined ? {} : { uncertaintyFringes }),
    ...(r.notes === null ? {} : { notes: r.notes }),
    fringeOrder: r.fringeOrder,
    fringeOrderUncertainty: r.fringeOrderUncertainty,
    retardationNm: r.retardationNm,
    supersedesId: r.supersedesId,
    amendmentReason: r.amendmentReason,
    recordedAt: r.recordedAt.toISOString(),
  };
}
