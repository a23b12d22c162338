import { sql } from 'drizzle-orm';
import type { Db } from '../../Db.ts';
import type { Actor } from '../Actor.ts';
import type { CheckedRow } from './checkImportRow.ts';

/**
 * Inserts checked rows (a few thousand at a time keeps the parameter at a few MB) with one
 * statement: the rows travel as ONE jsonb parameter read by jsonb_to_recordset, since drizzle
 * would bind a parameter per value and PGlite fails past 1,664 of them. The ids are the caller's,
 * so they come back in file order.
 */
export async function insertImportedReadings(db: Db, actor: Actor, importId: string, rows: readonly CheckedRow[], ids: readonly string[]): Promise<void> {
  const chunk = rows.map(({ siteId, columns: c }, i) => ({
    id: ids[i],
    site_id: siteId,
    stage: c.stage,
    load_n: c.loadN,
    observed_at: c.observedAt.toISOString(),
    operator: c.operator,
    wavelength_nm: c.wavelengthNm,
    method: c.method,
    raw_inputs: c.rawInputs,
    sign: c.sign,
    fringe_order: c.fringeOrder,
    fringe_order_uncertainty: c.fringeOrderUncertainty,
    retardation_nm: c.retardationNm,
    notes: c.notes,
  }));
  await db.execute(sql`
    insert into readings (id, lab_id, site_id, stage, load_n, observed_at, operator, wavelength_nm, method, raw_inputs, sign,
                          fringe_order, fringe_order_uncertainty, retardation_nm, notes, import_id, recorded_by_key_id)
    select x.id, ${actor.labId}::uuid, x.site_id, x.stage::reading_stage, x.load_n, x.observed_at, x.operator, x.wavelength_nm,
           x.method::reading_method, x.raw_inputs, x.sign::reading_sign, x.fringe_order, x.fringe_order_uncertainty, x.retardation_nm,
           x.notes, ${importId}::uuid, ${actor.keyId}::uuid
    from jsonb_to_recordset(${JSON.stringify(chunk)}::jsonb) as x(
      id uuid, site_id uuid, stage text, load_n float8, observed_at timestamptz, operator text, wavelength_nm float8, method text,
      raw_inputs jsonb, sign text, fringe_order float8, fringe_order_uncertainty float8, retardation_nm float8, notes text)`);
}
