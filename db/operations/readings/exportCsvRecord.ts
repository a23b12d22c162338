import type { ExportedReading } from './exportReadings.ts';
import type { EXPORT_COLUMNS } from './readingTransferColumns.ts';

type Cell = string | number | null | undefined;

/**
 * A reading as one CSV row in the import's columns. fringe_order and retardation_nm hold the
 * derived values, which for the direct and compensator methods are also their raw inputs.
 *
 * @example
 * exportCsvRecord(row) // tardy reading n = 1, β = 45°, at 577 nm
 * // { id: '…', model_code: 'UN-07', site_label: 'upper notch root', stage: 'before_load', load_n: null,
 * //   observed_at: '2026-11-21T14:05:00.000Z', operator: 'R. Okafor', wavelength_nm: 577, method: 'tardy',
 * //   lower_order: 1, analyzer_rotation_deg: 45, moved_fringe: 'lower', fringe_order: 1.25,
 * //   retardation_nm: 721.25, sign: 'positive', … }
 */
export function exportCsvRecord(r: ExportedReading): Record<(typeof EXPORT_COLUMNS)[number], Cell> {
  const raw = r.rawInputs as Record<string, Cell>;
  return {
    id: r.id,
    model_code: r.modelCode,
    site_label: r.siteLabel,
    stage: r.stage,
    load_n: r.loadN,
    observed_at: r.observedAt.toISOString(),
    operator: r.operator,
    wavelength_nm: r.wavelengthNm,
    method: r.method,
    whole_order: raw.wholeOrder,
    lower_order: raw.lowerOrder,
    analyzer_rotation_deg: raw.analyzerRotationDeg,
    moved_fringe: raw.movedFringe,
    srgb_hex: raw.srgbHex,
    named_colour: raw.namedColour,
    illuminant: raw.illuminant,
    retardation_nm: r.retardationNm,
    fringe_order: r.fringeOrder,
    sign: r.sign,
    uncertainty_fringes: raw.uncertaintyFringes,
    notes: r.notes,
    fringe_order_uncertainty: r.fringeOrderUncertainty,
    supersedes_id: r.supersedesId,
    amendment_reason: r.amendmentReason,
    recorded_at: r.recordedAt.toISOString(),
  };
}
