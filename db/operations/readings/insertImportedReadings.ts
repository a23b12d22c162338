import { sql } from 'drizzle-orm';
import type { Db } from '../../Db.ts';
import type { Actor } from '../Actor.ts';
import type { CheckedRow } from './checkImportRow.ts';

/** A checked row with its new id and, for an amendment rebuilt from an export, what it supersedes. */
export interface ImportRow extends CheckedRow {
  id: string;
  supersedesId: string | null;
  amendmentReason: string | null;
}

/**
 * Inserts checked rows (a few thousand at a time keeps the parameter at a few MB) with one
 * statement: the rows travel as ONE jsonb parameter read by jsonb_to_recordset, since drizzle
 * would bind a parameter per value and PGlite fails past 1,664 of them. A row may supersede one
 * in the same statement: the foreign key is checked at the statement's end.
 */
export async function insertImportedReadings(db: Db, actor: Actor, importId: string, rows: readonly ImportRow[]): Promise<void> {
  // Absent keys read as null and keep the parameter, which the server parses row by row, smaller.
  const orAbsent = <T>(value: T | null) => (value === null ? undefined : value);
  const chunk = rows.map(({ id, siteId, columns: c, supersedesId, amendmentReason }) => ({
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
  }));
  await db.execute(sql`
    insert into readings (id, lab_id, site_id, stage, load_n, observed_at, operator, wavelength_nm, method, raw_inputs, sign,
                          fringe_order, fringe_order_uncertainty, retardation_nm, notes, supersedes_id, amendment_reason, import_id, recorded_by_key_id)
    select x.id, ${actor.labId}::uuid, x.site_id, x.stage::reading_stage, x.load_n, x.observed_at, x.operator, x.wavelength_nm,
           x.method::reading_method, x.raw_inputs, x.sign::reading_sign, x.fringe_order, x.fringe_order_uncertainty, x.retardation_nm,
           x.notes, x.supersedes_id, x.amendment_reason, ${importId}::uuid, ${actor.keyId}::uuid
    from jsonb_to_recordset(${JSON.stringify(chunk)}::jsonb) as x(
      id uuid, site_id uuid, stage text, load_n float8, observed_at timestamptz, operator text, wavelength_nm float8, method text,
      raw_inputs jsonb, sign text, fringe_order float8, fringe_order_uncertainty float8, retardation_nm float8, notes text,
      supersedes_id uuid, amendment_reason text)`);
}
