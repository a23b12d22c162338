import { type SQL, sql } from 'drizzle-orm';
import type { EdgeAgingQuery } from '../../inputs/trends.ts';
import { trendReadingsSql } from './trendReadingsSql.ts';

const ISO = `'YYYY-MM-DD"T"HH24:MI:SS.MS"Z"'`;

const siteCondition = (sites: EdgeAgingQuery['sites'], alias: string) =>
  sql.raw(sites === 'machined_edge' ? `${alias}.kind = 'machined_edge'` : `${alias}.on_free_edge`);

/** Residual order against hours since the latest machining before each reading; null hours: none recorded. */
export function edgeAgingPointsSql(labId: string, query: EdgeAgingQuery): SQL {
  return sql`
    select extract(epoch from (tr.observed_at - tr.machined_at)) / 3600.0 as hours, tr.order_577 as value, tr.model_id, tr.material_name
    from ${trendReadingsSql(labId, query, { where: siteCondition(query.sites, 's') })} tr`;
}

/**
 * Models still in storage: their latest event other than an inspection is 'stored' (an
 * inspection does not take a model out of storage; loading, annealing or machining do). With
 * their latest machining and their latest reading since then at the stage on the chosen sites.
 */
export function storedModelsSql(labId: string, query: EdgeAgingQuery): SQL {
  const conditions: SQL[] = [sql`m.lab_id = ${labId}::uuid`];
  if (query.batch !== undefined) conditions.push(sql`b.code = ${query.batch}`);
  if (query.material !== undefined) conditions.push(sql`mat.name = ${query.material}`);
  if (query.geometryKind !== undefined) conditions.push(sql`m.geometry_kind = ${query.geometryKind}::geometry_kind`);
  if (query.machiningMethod !== undefined) conditions.push(sql`lm.machining_method = ${query.machiningMethod}`);
  const { machiningMethod: _method, ...readingFilter } = query;
  return sql`
    with last_machining as (
      select distinct on (e.model_id) e.model_id, e.occurred_at, e.machining_method
      from model_events e where e.lab_id = ${labId}::uuid and e.kind = 'machined'
      order by e.model_id, e.occurred_at desc, e.id desc
    ), last_state as (
      select distinct on (e.model_id) e.model_id, e.kind
      from model_events e where e.lab_id = ${labId}::uuid and e.kind <> 'inspected'
      order by e.model_id, e.occurred_at desc, e.recorded_at desc, e.id desc
    ), latest as (
      select distinct on (tr.model_id) tr.model_id, tr.order_577, tr.observed_at
      from ${trendReadingsSql(labId, readingFilter, { where: siteCondition(query.sites, 's') })} tr
      order by tr.model_id, tr.observed_at desc, tr.order_577 desc
    )
    select m.id as model_id, m.code as model_code, lm.machining_method,
           to_char(lm.occurred_at at time zone 'UTC', ${sql.raw(ISO)}) as machined_at,
           extract(epoch from lm.occurred_at) * 1000 as machined_ms,
           latest.order_577 as latest_order, to_char(latest.observed_at at time zone 'UTC', ${sql.raw(ISO)}) as latest_observed_at
    from models m
    join batches b on b.id = m.batch_id
    join materials mat on mat.id = b.material_id
    join last_machining lm on lm.model_id = m.id
    join last_state ls on ls.model_id = m.id and ls.kind = 'stored'
    left join latest on latest.model_id = m.id and latest.observed_at >= lm.occurred_at
    where ${sql.join(conditions, sql` and `)}
      and exists (select 1 from sites s2 where s2.model_id = m.id and ${siteCondition(query.sites, 's2')})
    order by m.code`;
}
