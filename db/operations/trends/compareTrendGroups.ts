import { type SQL, sql } from 'drizzle-orm';
import { compareGroups } from '../../../src/statistics/compareGroups.ts';
import type { Db } from '../../Db.ts';
import type { CompareQuery } from '../../inputs/trends.ts';
import { rowsOf } from '../../rowsOf.ts';
import type { Actor } from '../Actor.ts';
import { GROUP_KEY_NOTES, groupKeySql } from './groupKeySql.ts';
import { REFERENCE_WAVELENGTH_NM, TREND_BASIS_NOTES, trendReadingsSql } from './trendReadingsSql.ts';

/** Larger groups leave their values out of the answer to keep it small. */
export const MAX_LISTED_VALUES = 500;

interface UnitRow {
  group_key: string;
  value: number;
  reading_count: number;
  model_id: string;
}

/**
 * The values of the two groups, one per model (its mean in the group) or one per reading. The
 * key condition sits in the outer query because a key like the week is computed from `tr`.
 */
export function compareUnitsSql(labId: string, query: CompareQuery): SQL {
  const value = sql.raw(query.measure === 'stress' ? 'tr.stress_mpa' : 'tr.order_577');
  const key = groupKeySql(query.by);
  const source = trendReadingsSql(labId, query);
  if (query.unit === 'reading') {
    return sql`
      select ${key} as group_key, ${value} as value, 1 as reading_count, tr.model_id
      from ${source} tr where ${key} in (${query.a}, ${query.b})
      order by group_key, tr.reading_id`;
  }
  return sql`
    select ${key} as group_key, avg(${value}) as value, count(*)::int as reading_count, tr.model_id
    from ${source} tr where ${key} in (${query.a}, ${query.b})
    group by ${key}, tr.model_id
    order by group_key, tr.model_id`;
}

function side(rows: UnitRow[], key: string) {
  const mine = rows.filter((r) => r.group_key === key);
  return {
    key,
    values: mine.map((r) => Number(r.value)),
    readingCount: mine.reduce((n, r) => n + Number(r.reading_count), 0),
    modelCount: new Set(mine.map((r) => r.model_id)).size,
  };
}

/**
 * Two groups of one dimension (two batches, two machining methods…) compared by Welch's t on
 * the means and Mann–Whitney U on the ranks (compareGroups); declines with fewer than three
 * values a side. By default each model is one value, since readings on one model share its
 * fabrication and are not independent.
 *
 * @example
 * await compareTrendGroups(db, actor, { by: 'batch', a: 'PC-A', b: 'PC-B', unit: 'model', measure: 'fringeOrder', confidence: 0.95, stage: 'before_load' });
 * // { a: { key: 'PC-A', n: 6, … }, b: { key: 'PC-B', n: 6, … }, comparison: { decided: true, welch: { … }, mannWhitney: { … } } }
 */
export async function compareTrendGroups(db: Db, actor: Actor, query: CompareQuery) {
  const rows = rowsOf<UnitRow>(await db.execute(compareUnitsSql(actor.labId, query)));
  const [a, b] = [side(rows, query.a), side(rows, query.b)];
  const comparison = compareGroups(a.values, b.values, query.confidence);
  const warnings = [a, b].filter((g) => g.values.length === 0).map((g) => `no current readings at stage ${query.stage} have ${query.by} = "${g.key}" under these filters`);
  const { a: _a, b: _b, by, unit, measure, confidence, stage, ...filters } = query;
  const summary = (g: typeof a) => ({
    key: g.key,
    n: g.values.length,
    readingCount: g.readingCount,
    modelCount: g.modelCount,
    ...(g.values.length <= MAX_LISTED_VALUES ? { values: g.values } : {}),
  });
  return {
    by,
    unit,
    measure,
    valueUnit: measure === 'stress' ? 'MPa' : `fringe order at ${REFERENCE_WAVELENGTH_NM} nm`,
    stage,
    confidence,
    filters,
    readingCount: a.readingCount + b.readingCount,
    modelCount: new Set(rows.map((r) => r.model_id)).size,
    a: summary(a),
    b: summary(b),
    comparison,
    warnings,
    notes: [
      ...TREND_BASIS_NOTES,
      GROUP_KEY_NOTES[by],
      unit === 'model' ? 'Each value is one model\'s mean over its readings in the group.' : 'Each value is one reading; readings on one model are not independent, so the p-values are optimistic.',
      'Welch\'s interval is for mean(a) − mean(b); Mann–Whitney is two-sided.',
    ],
  };
}
