import type { CheckedRow } from './checkImportRow.ts';

/** A checked row with its new id and, for an amendment rebuilt from an export, what it supersedes. */
export interface ImportRow extends CheckedRow {
  id: string;
  supersedesId: string | null;
  amendmentReason: string | null;
}

/** Rows ready for insertImportedReadings: the one jsonb parameter's text. */
export interface EncodedImportRows {
  json: string;
}

// Absent keys read as null and keep the parameter, which the server parses row by row, smaller.
const orAbsent = <T>(value: T | null) => (value === null ? undefined : value);

/**
 * Encodes checked rows as the JSON array insertImportedReadings sends, apart from the insert so
 * that the import can encode the next chunk while the server is still busy with the previous one.
 *
 * @example
 * encodeImportRows([{ id, siteId, columns, supersedesId: null, amendmentReason: null, row: 2 }]);
 * // { json: '[{"id":"…","site_id":"…","stage":"before_load",…}]' }
 */
export function encodeImportRows(rows: readonly ImportRow[]): EncodedImportRows {
  const json = JSON.stringify(
    rows.map(({ id, siteId, columns: c, supersedesId, amendmentReason }) => ({
      id,
      site_id: siteId,
      stage: c.stage,
      load_n: orAbsent(c.loadN),
      observed_at: c.observedAt.toISOString(),
      operator: c.operator,
      wavelength_nm: orAbsent(c.wavelengthNm),
      method: c.method,
      raw_inputs: c.rawInputs,
      sign: c.sign,
      fringe_order: c.fringeOrder,
      fringe_order_uncertainty: c.fringeOrderUncertainty,
      retardation_nm: c.retardationNm,
      notes: orAbsent(c.notes),
      supersedes_id: orAbsent(supersedesId),
      amendment_reason: orAbsent(amendmentReason),
    })),
  );
  return { json };
}
