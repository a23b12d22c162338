import { type SQL, sql } from 'drizzle-orm';
import { COMMON_PRACTICE_FITNESS_CRITERIA } from '../../../src/acceptance/commonPracticeFitnessCriteria.ts';

export interface OutcomeFilter {
  labId: string;
  windowH: number;
  runId?: string | undefined;
  materialFamily?: string | undefined;
  guidanceKey?: string | undefined;
}

const COMMON_PRACTICE_LIMIT = COMMON_PRACTICE_FITNESS_CRITERIA.usual.maxResidualFringeOrder;

/**
 * `with runs as (...), site_outcomes as (...)`: one row per current run, model of its load and
 * site of that model, with the newest current before_anneal reading in the window before the
 * start, the first current after_anneal reading in the window after the planned end, the
 * model's residual limit in fringes and the guard-band decision on the after reading. The
 * limit is the model's (else its project's) acceptance limit in force, a stress limit turned
 * into fringes by N = σ·t/fσ, else the common-practice 0.2 fringe. Readings are magnitudes.
 */
export function annealOutcomesSql(f: OutcomeFilter): SQL {
  const window = sql`(${f.windowH})::float8 * interval '1 hour'`;
  return sql`
    with runs as (
      select r.id as run_id, r.started_at, r.started_at + p.total_duration_h * interval '1 hour' as ended_at,
             p.id as plan_id, p.guidance_key, p.guidance_entry_id, p.catalogue_version,
             (select l.verdict from oven_logs l where l.run_id = r.id
                and not exists (select 1 from oven_logs s where s.supersedes_id = l.id)
              order by l.imported_at desc limit 1) as log_verdict
      from annealing_runs r join annealing_plans p on p.id = r.plan_id
      where r.lab_id = ${f.labId}::uuid
        and not exists (select 1 from annealing_runs s where s.supersedes_id = r.id)
        ${f.runId ? sql`and r.id = ${f.runId}::uuid` : sql``}
        ${f.guidanceKey ? sql`and p.guidance_key = ${f.guidanceKey}` : sql``}
    ),
    measured as (
      select runs.*, m.id as model_id, m.code as model_code, mat.id as material_id, mat.name as material_name,
             mat.family::text as material_family, st.id as site_id, st.label as site_label,
             b.id as before_id, b.fringe_order as before_order, b.fringe_order_uncertainty as before_u, b.observed_at as before_at,
             a.id as after_id, a.fringe_order as after_order, a.fringe_order_uncertainty as after_u, a.observed_at as after_at,
             coalesce(crit.max_residual_fringe_order,
                      crit.max_residual_stress_mpa * coalesce(st.local_thickness_mm, m.thickness_mm) / mat.fringe_value_n_per_mm,
                      ${COMMON_PRACTICE_LIMIT}::float8) as limit_order,
             case when crit.max_residual_fringe_order is not null then crit.scope || '_limit'
                  when crit.max_residual_stress_mpa is not null then crit.scope || '_stress_limit'
                  else 'common_practice' end as limit_source,
             coalesce(crit.coverage_factor, 2) as coverage_factor
      from runs
      join annealing_run_models rm on rm.run_id = runs.run_id
      join models m on m.id = rm.model_id
      join batches bt on bt.id = m.batch_id
      join materials mat on mat.id = bt.material_id
      join sites st on st.model_id = m.id
      left join lateral (
        select rd.id, rd.fringe_order, rd.fringe_order_uncertainty, rd.observed_at from readings rd
        where rd.site_id = st.id and rd.stage = 'before_anneal'
          and rd.observed_at <= runs.started_at and rd.observed_at >= runs.started_at - ${window}
          and not exists (select 1 from readings s where s.supersedes_id = rd.id)
        order by rd.observed_at desc limit 1) b on true
      left join lateral (
        select rd.id, rd.fringe_order, rd.fringe_order_uncertainty, rd.observed_at from readings rd
        where rd.site_id = st.id and rd.stage = 'after_anneal'
          and rd.observed_at >= runs.ended_at and rd.observed_at <= runs.ended_at + ${window}
          and not exists (select 1 from readings s where s.supersedes_id = rd.id)
        order by rd.observed_at asc limit 1) a on true
      left join lateral (
        select ac.max_residual_fringe_order, ac.max_residual_stress_mpa, ac.coverage_factor,
               case when ac.model_id is null then 'project' else 'model' end as scope
        from acceptance_criteria ac
        where ac.lab_id = m.lab_id and (ac.model_id = m.id or (ac.model_id is null and ac.project = m.project))
          and (ac.max_residual_fringe_order is not null or ac.max_residual_stress_mpa is not null)
        order by (ac.model_id is null), ac.created_at desc, ac.id desc limit 1) crit on true
      ${f.materialFamily ? sql`where mat.family = ${f.materialFamily}::material_family` : sql``}
    ),
    site_outcomes as (
      select measured.*,
             case when after_order is null then null
                  when after_order + coverage_factor * after_u <= limit_order then 'conforming'
                  when after_order - coverage_factor * after_u > limit_order then 'not_conforming'
                  else 'undecided' end as after_decision,
             case when before_order > coverage_factor * before_u and after_order is not null
                  then (before_order - after_order) / before_order end as relief
      from measured
    )`;
}
