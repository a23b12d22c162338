import { sql } from 'drizzle-orm';
import type { Db } from '../../Db.ts';
import type { Actor } from '../Actor.ts';
import type { EncodedImportRows } from './encodeImportRows.ts';

/**
 * Inserts checked rows (a few thousand at a time keeps the parameter at a few MB) with one
 * statement: the rows travel as ONE jsonb parameter read by jsonb_to_recordset, since drizzle
 * would bind a parameter per value and PGlite fails past 1,664 of them. A row may supersede one
 * in the same statement: the foreign key is checked at the statement's end.
 */
export async function insertImportedReadings(db: Db, actor: Actor, importId: string, rows: EncodedImportRows): Promise<void> {
  await db.execute(sql`
    insert into readings (id, lab_id, site_id, stage, load_n, observed_at, operator, wavelength_nm, method, raw_inputs, sign,
                          fringe_order, fringe_order_uncertainty, retardation_nm, notes, supersedes_id, amendment_reason, import_id, recorded_by_key_id)
    select x.id, ${actor.labId}::uuid, x.site_id, x.stage::reading_stage, x.load_n, x.observed_at, x.operator, x.wavelength_nm,
           x.method::reading_method, x.raw_inputs, x.sign::reading_sign, x.fringe_order, x.fringe_order_uncertainty, x.retardation_nm,
           x.notes, x.supersedes_id, x.amendment_reason, ${importId}::uuid, ${actor.keyId}::uuid
    from jsonb_to_recordset(${rows.json}::jsonb) as x(
      id uuid, site_id uuid, stage text, load_n float8, observed_at timestamptz, operator text, wavelength_nm float8, method text,
      raw_inputs jsonb, sign text, fringe_order float8, fringe_order_uncertainty float8, retardation_nm float8, notes text,
      supersedes_id uuid, amendment_reason text)`);
}
