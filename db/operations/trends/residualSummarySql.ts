import { type SQL, sql } from 'drizzle-orm';
import type { ResidualTrendQuery } from '../../inputs/trends.ts';
import { groupKeySql } from './groupKeySql.ts';
import { trendReadingsSql } from './trendReadingsSql.ts';

export interface ResidualSummarySqlInput {
  labId: string;
  query: ResidualTrendQuery;
  limitOrder: number;
}

// Aliases are built from positions, never from input, so sql.raw cannot carry user text.
function statistics(column: 'order_577' | 'stress_mpa', prefix: string, percentiles: readonly number[]): SQL {
  const c = sql.raw(`keyed.${column}`);
  const parts = [
    sql`avg(${c}) as ${sql.raw(`${prefix}_mean`)}`,
    sql`stddev_samp(${c}) as ${sql.raw(`${prefix}_sd`)}`,
    sql`percentile_cont(0.5) within group (order by ${c}) as ${sql.raw(`${prefix}_median`)}`,
    ...percentiles.map((p, i) => sql`percentile_cont(${p}::float8) within group (order by ${c}) as ${sql.raw(`${prefix}_p${i}`)}`),
  ];
  return sql.join(parts, sql`, `);
}

/**
 * The grouped residual statistics as ONE statement: per group and, through the empty grouping
 * set, for all readings together (is_total = 1). percentile_cont is the linear-interpolation
 * quantile (Hyndman–Fan type 7); readings and models above the limit are counted per group.
 */
export function residualSummarySql({ labId, query, limitOrder }: ResidualSummarySqlInput): SQL {
  return sql`
    with keyed as (select ${groupKeySql(query.groupBy)} as group_key, tr.* from ${trendReadingsSql(labId, query)} tr)
    select grouping(keyed.group_key)::int as is_total, keyed.group_key,
           count(*)::int as reading_count, count(distinct keyed.model_id)::int as model_count,
           ${statistics('order_577', 'order', query.p)},
           ${statistics('stress_mpa', 'stress', query.p)},
           count(*) filter (where keyed.order_577 > ${limitOrder}::float8)::int as readings_over,
           count(distinct keyed.model_id) filter (where keyed.order_577 > ${limitOrder}::float8)::int as models_over,
           to_char(min(keyed.observed_at) at time zone 'UTC', 'YYYY-MM-DD"T"HH24:MI:SS.MS"Z"') as first_observed_at,
           to_char(max(keyed.observed_at) at time zone 'UTC', 'YYYY-MM-DD"T"HH24:MI:SS.MS"Z"') as last_observed_at
    from keyed
    group by grouping sets ((keyed.group_key), ())
    order by is_total, keyed.group_key nulls last`;
}
