import { type SQL, sql } from 'drizzle-orm';
import type { TrendFilter } from '../../inputs/trends.ts';

/** Every trend reduces fringe orders to this wavelength (the mercury-green line labs use most). */
export const REFERENCE_WAVELENGTH_NM = 577;

export const TREND_BASIS_NOTES = [
  `Fringe orders are reduced to ${REFERENCE_WAVELENGTH_NM} nm as retardation_nm / ${REFERENCE_WAVELENGTH_NM} (dispersion of the stress-optic coefficient neglected). Magnitudes: the sign of a reading is not used.`,
  'Residual stress is N·fσ/t with the material\'s catalogue fringe value fσ (the material record, at its stated wavelength), not a batch calibration, and t the site\'s local thickness where recorded, else the model\'s thickness. It is σ1 − σ2, equal to the edge stress at free-edge sites.',
  'Only current readings count: a reading superseded by an amendment is left out, its amendment counts instead.',
];

export interface TrendSourceOptions {
  /** Extra condition on the source columns (alias `tr` is not yet available: use r, s, m, b, mat, mach). */
  where?: SQL | undefined;
}

/**
 * The current readings of a lab at one stage with everything a trend groups or filters by, as
 * a subquery. Machining method and time come from the latest 'machined' event at or before
 * each reading, found by a range join on per-model machining windows (one hash join instead of
 * a lookup per reading). Columns: reading_id, observed_at, operator, order_577, stress_mpa,
 * site_id, site_label, site_kind, on_free_edge, model_id, model_code, geometry_kind,
 * batch_code, material_name, machining_method, machined_at.
 */
export function trendReadingsSql(labId: string, filter: TrendFilter, options: TrendSourceOptions = {}): SQL {
  const conditions: SQL[] = [sql`r.lab_id = ${labId}::uuid`, sql`r.stage = ${filter.stage}::reading_stage`];
  if (filter.batch !== undefined) conditions.push(sql`b.code = ${filter.batch}`);
  if (filter.material !== undefined) conditions.push(sql`mat.name = ${filter.material}`);
  if (filter.geometryKind !== undefined) conditions.push(sql`m.geometry_kind = ${filter.geometryKind}::geometry_kind`);
  if (filter.machiningMethod !== undefined) conditions.push(sql`mach.machining_method = ${filter.machiningMethod}`);
  if (filter.operator !== undefined) conditions.push(sql`r.operator = ${filter.operator}`);
  if (filter.siteKind !== undefined) conditions.push(sql`s.kind = ${filter.siteKind}::site_kind`);
  if (filter.from !== undefined) conditions.push(sql`r.observed_at >= ${filter.from}::timestamptz`);
  if (filter.to !== undefined) conditions.push(sql`r.observed_at < ${filter.to}::timestamptz`);
  if (options.where) conditions.push(options.where);
  return sql`(
    select r.id as reading_id, r.observed_at, r.operator,
           r.retardation_nm / ${sql.raw(String(REFERENCE_WAVELENGTH_NM))}.0 as order_577,
           r.retardation_nm * mat.fringe_value_n_per_mm / (mat.fringe_value_wavelength_nm * coalesce(s.local_thickness_mm, m.thickness_mm)) as stress_mpa,
           s.id as site_id, s.label as site_label, s.kind::text as site_kind, s.on_free_edge,
           m.id as model_id, m.code as model_code, m.geometry_kind::text as geometry_kind,
           b.code as batch_code, mat.name as material_name,
           mach.machining_method, mach.occurred_at as machined_at
    from readings r
    join sites s on s.id = r.site_id
    join models m on m.id = s.model_id
    join batches b on b.id = m.batch_id
    join materials mat on mat.id = b.material_id
    left join (
      select e.model_id, e.machining_method, e.occurred_at,
             lead(e.occurred_at) over (partition by e.model_id order by e.occurred_at, e.id) as next_at
      from model_events e
      where e.lab_id = ${labId}::uuid and e.kind = 'machined'
    ) mach on mach.model_id = m.id and mach.occurred_at <= r.observed_at and (mach.next_at is null or r.observed_at < mach.next_at)
    where ${sql.join(conditions, sql` and `)}
      and not exists (select 1 from readings nx where nx.supersedes_id = r.id and nx.supersedes_id is not null)
  )`;
}
