import type { Db } from '../../Db.ts';
import { DEFAULT_LIMIT_ORDER, type ResidualTrendQuery } from '../../inputs/trends.ts';
import { rowsOf } from '../../rowsOf.ts';
import type { Actor } from '../Actor.ts';
import { GROUP_KEY_NOTES } from './groupKeySql.ts';
import { residualSummarySql } from './residualSummarySql.ts';
import { REFERENCE_WAVELENGTH_NM, TREND_BASIS_NOTES } from './trendReadingsSql.ts';

export interface Distribution {
  mean: number | null;
  /** Sample standard deviation (n − 1); null below two readings. */
  standardDeviation: number | null;
  median: number | null;
  percentiles: { p: number; value: number | null }[];
}

export interface ResidualGroupSummary {
  key: string | null;
  readingCount: number;
  modelCount: number;
  fringeOrder577: Distribution;
  stressMPa: Distribution;
  overLimit: { readings: number; readingShare: number | null; models: number; modelShare: number | null };
  firstObservedAt: string | null;
  lastObservedAt: string | null;
}

export type SummaryRow = Record<string, number | string | null>;

const num = (v: unknown): number | null => (v === null || v === undefined ? null : Number(v));

function distribution(row: SummaryRow, prefix: string, percentiles: readonly number[]): Distribution {
  return {
    mean: num(row[`${prefix}_mean`]),
    standardDeviation: num(row[`${prefix}_sd`]),
    median: num(row[`${prefix}_median`]),
    percentiles: percentiles.map((p, i) => ({ p, value: num(row[`${prefix}_p${i}`]) })),
  };
}

/** One row of residualSummarySql as the API answers it. */
export function groupSummaryOf(row: SummaryRow, percentiles: readonly number[]): ResidualGroupSummary {
  const readingCount = Number(row.reading_count);
  const modelCount = Number(row.model_count);
  const readingsOver = Number(row.readings_over);
  const modelsOver = Number(row.models_over);
  return {
    key: row.group_key === null ? null : String(row.group_key),
    readingCount,
    modelCount,
    fringeOrder577: distribution(row, 'order', percentiles),
    stressMPa: distribution(row, 'stress', percentiles),
    overLimit: {
      readings: readingsOver,
      readingShare: readingCount === 0 ? null : readingsOver / readingCount,
      models: modelsOver,
      modelShare: modelCount === 0 ? null : modelsOver / modelCount,
    },
    firstObservedAt: row.first_observed_at === null ? null : String(row.first_observed_at),
    lastObservedAt: row.last_observed_at === null ? null : String(row.last_observed_at),
  };
}

/**
 * Residual fringe order and stress at one stage, grouped by one dimension, over the lab's
 * current readings; aggregated in one SQL statement with a row for all readings together.
 *
 * @example
 * await summariseResiduals(db, actor, { stage: 'before_load', groupBy: 'batch', p: [0.9], format: 'json' });
 * // { readingCount: 24, modelCount: 6, limit: { fringeOrder: 0.2, source: 'common practice …' },
 * //   groups: [{ key: 'PC-2026-07', readingCount: 12, fringeOrder577: { mean: 0.081, … }, … }], … }
 */
export async function summariseResiduals(db: Db, actor: Actor, query: ResidualTrendQuery) {
  const limitOrder = query.limitOrder ?? DEFAULT_LIMIT_ORDER;
  const rows = rowsOf<SummaryRow>(await db.execute(residualSummarySql({ labId: actor.labId, query, limitOrder })));
  const summaries = rows.map((row) => ({ total: Number(row.is_total) === 1, summary: groupSummaryOf(row, query.p) }));
  const total = summaries.find((s) => s.total)!.summary;
  const { p, format: _format, groupBy, stage, limitOrder: _given, ...filters } = query;
  return {
    stage,
    groupBy,
    filters,
    percentilesRequested: p,
    referenceWavelengthNm: REFERENCE_WAVELENGTH_NM,
    limit: {
      fringeOrder: limitOrder,
      source: query.limitOrder === undefined ? `default ${DEFAULT_LIMIT_ORDER} fringe, common practice (not a standard)` : 'given in the query',
      rule: 'a reading fails when its order exceeds the limit; a model fails when any of its readings in the group does',
    },
    readingCount: total.readingCount,
    modelCount: total.modelCount,
    total: { ...total, key: null },
    groups: summaries.filter((s) => !s.total).map((s) => s.summary),
    notes: [...TREND_BASIS_NOTES, GROUP_KEY_NOTES[groupBy], 'Percentiles are percentile_cont: linear interpolation between closest ranks.'],
  };
}

export type ResidualSummary = Awaited<ReturnType<typeof summariseResiduals>>;
