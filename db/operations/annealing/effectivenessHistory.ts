import { sql } from 'drizzle-orm';
import { COMMON_PRACTICE_FITNESS_CRITERIA } from '../../../src/acceptance/commonPracticeFitnessCriteria.ts';
import type { Db } from '../../Db.ts';
import { rowsOf } from '../../rowsOf.ts';
import type { Actor } from '../Actor.ts';
import { annealOutcomesSql } from './annealOutcomesSql.ts';

interface HistoryRow {
  material_id: string;
  material_name: string;
  material_family: string;
  guidance_key: string;
  runs: number;
  models_measured: number;
  models_within_limit: number;
  models_over_limit: number;
  sites_with_relief: number;
  median_relief: number | null;
  min_relief: number | null;
  max_relief: number | null;
  limit_sources: string[];
}

/**
 * What each cycle achieved per material over the lab's history: runs, models read after the
 * run, how many came out within their limit, and the spread of anneal relief. Aggregated in
 * SQL, so it stays one query however long the history.
 */
export async function effectivenessHistory(db: Db, actor: Actor, filter: { windowH: number; materialFamily?: string | undefined; guidanceKey?: string | undefined; materialId?: string | undefined }) {
  const result = await db.execute(sql`
    ${annealOutcomesSql({ labId: actor.labId, windowH: filter.windowH, materialFamily: filter.materialFamily, guidanceKey: filter.guidanceKey })},
    per_model as (
      select material_id, material_name, material_family, guidance_key, run_id, model_id,
             count(after_decision) as sites_read,
             bool_and(after_decision = 'conforming') as all_conforming,
             bool_or(after_decision = 'not_conforming') as any_over
      from site_outcomes group by material_id, material_name, material_family, guidance_key, run_id, model_id
    ),
    models_agg as (
      select material_id, material_name, material_family, guidance_key,
             count(distinct run_id)::int as runs,
             (count(*) filter (where sites_read > 0))::int as models_measured,
             (count(*) filter (where sites_read > 0 and all_conforming))::int as models_within_limit,
             (count(*) filter (where any_over))::int as models_over_limit
      from per_model group by material_id, material_name, material_family, guidance_key
    ),
    sites_agg as (
      select material_id, guidance_key, count(relief)::int as sites_with_relief,
             percentile_cont(0.5) within group (order by relief) as median_relief,
             min(relief) as min_relief, max(relief) as max_relief,
             array_agg(distinct limit_source) as limit_sources
      from site_outcomes group by material_id, guidance_key
    )
    select m.*, s.sites_with_relief, s.median_relief, s.min_relief, s.max_relief, s.limit_sources
    from models_agg m join sites_agg s using (material_id, guidance_key)
    ${filter.materialId ? sql`where m.material_id = ${filter.materialId}::uuid` : sql``}
    order by m.material_name, m.guidance_key`);
  return rowsOf<HistoryRow>(result).map((r) => ({
    materialId: r.material_id,
    materialName: r.material_name,
    materialFamily: r.material_family,
    guidanceKey: r.guidance_key,
    runs: r.runs,
    modelsMeasured: r.models_measured,
    modelsWithinLimit: r.models_within_limit,
    modelsOverLimit: r.models_over_limit,
    withinLimitFraction: r.models_measured > 0 ? r.models_within_limit / r.models_measured : null,
    sitesWithRelief: r.sites_with_relief,
    medianRelief: r.median_relief === null ? null : Number(r.median_relief),
    minRelief: r.min_relief === null ? null : Number(r.min_relief),
    maxRelief: r.max_relief === null ? null : Number(r.max_relief),
    limitSources: r.limit_sources,
    limitNote: r.limit_sources.includes('common_practice') ? `Some models had no acceptance limit: ${COMMON_PRACTICE_FITNESS_CRITERIA.usual.maxResidualFringeOrder} fringe used (${COMMON_PRACTICE_FITNESS_CRITERIA.flag}).` : null,
  }));
}
