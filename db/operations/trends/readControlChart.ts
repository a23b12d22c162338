import { type SQL, sql } from 'drizzle-orm';
import { individualsMovingRangeChart } from '../../../src/statistics/individualsMovingRangeChart.ts';
import type { Db } from '../../Db.ts';
import type { ControlChartQuery } from '../../inputs/trends.ts';
import { rowsOf } from '../../rowsOf.ts';
import type { Actor } from '../Actor.ts';
import { getModel } from '../models/getModel.ts';
import { requireBatchCode } from './requireBatchCode.ts';
import { REFERENCE_WAVELENGTH_NM, TREND_BASIS_NOTES, trendReadingsSql } from './trendReadingsSql.ts';

const ISO = `'YYYY-MM-DD"T"HH24:MI:SS.MS"Z"'`;
const iso = (column: string) => sql.raw(`to_char(${column} at time zone 'UTC', ${ISO})`);

interface SeriesRow {
  x: string;
  value: number;
  reading_id?: string;
  site_label?: string;
  model_id?: string;
  model_code?: string;
  reading_count?: number;
}

/** A model's readings at its sites, in observation order. */
export function modelSeriesSql(labId: string, query: ControlChartQuery): SQL {
  const value = sql.raw(query.measure === 'stress' ? 'tr.stress_mpa' : 'tr.order_577');
  return sql`
    select ${iso('tr.observed_at')} as x, ${value} as value, tr.reading_id, tr.site_label
    from ${trendReadingsSql(labId, query, { where: sql`m.id = ${query.modelId!}::uuid` })} tr
    order by tr.observed_at, tr.reading_id`;
}

/**
 * One point per model of a batch: its mean at the stage, placed at its machining time (the
 * latest machining before its readings) or at its first reading. Models with no machining
 * recorded cannot be placed on a machining axis and are counted instead.
 */
export function batchSeriesSql(labId: string, query: ControlChartQuery): SQL {
  const value = sql.raw(query.measure === 'stress' ? 'tr.stress_mpa' : 'tr.order_577');
  const at = query.orderBy === 'machining' ? 'max(tr.machined_at)' : 'min(tr.observed_at)';
  return sql`
    select ${iso(at)} as x, avg(${value}) as value, tr.model_id, tr.model_code, count(*)::int as reading_count
    from ${trendReadingsSql(labId, query)} tr
    group by tr.model_id, tr.model_code
    order by ${sql.raw(at)} nulls last, tr.model_code`;
}

/**
 * Individuals and moving-range chart of a model's readings (one stage) or of a batch's models
 * (one point each), with the run rules of individualsMovingRangeChart flagged per point.
 *
 * @example
 * await readControlChart(db, actor, { batch: 'PC-2026-07', stage: 'before_load', orderBy: 'machining', measure: 'fringeOrder', twoOfThree: false });
 * // { series: 'batch', pointCount: 24, chart: { defined: true, centreLine: 0.084, individuals: { upperLimit: 0.15, … }, points: [{ x: '2026-11-02T09:00:00.000Z', value: 0.07, modelCode: 'UN-01', rules: [] }, …] } }
 */
export async function readControlChart(db: Db, actor: Actor, query: ControlChartQuery) {
  if (query.modelId) await getModel(db, actor, query.modelId);
  else await requireBatchCode(db, actor, query.batch!);
  const series: 'model' | 'batch' = query.modelId ? 'model' : 'batch';
  const rows = rowsOf<SeriesRow>(await db.execute(series === 'model' ? modelSeriesSql(actor.labId, query) : batchSeriesSql(actor.labId, query)));
  const placed = rows.filter((r) => r.x !== null);
  const chart = individualsMovingRangeChart(
    placed.map((r) => ({ x: r.x, value: Number(r.value) })),
    { twoOfThreeBeyondTwoSigma: query.twoOfThree },
  );
  const details = placed.map((r) =>
    series === 'model'
      ? { readingId: r.reading_id!, siteLabel: r.site_label! }
      : { modelId: r.model_id!, modelCode: r.model_code!, readingCount: Number(r.reading_count) },
  );
  const readingCount = series === 'model' ? placed.length : placed.reduce((n, r) => n + Number(r.reading_count), 0);
  return {
    series,
    stage: query.stage,
    measure: query.measure,
    unit: query.measure === 'stress' ? 'MPa' : `fringe order at ${REFERENCE_WAVELENGTH_NM} nm`,
    axis: series === 'model' ? 'reading time' : query.orderBy === 'machining' ? 'machining time of each model' : 'first reading time of each model',
    readingCount,
    modelCount: series === 'model' ? (placed.length > 0 ? 1 : 0) : placed.length,
    modelsWithoutMachiningTime: rows.length - placed.length,
    chart: chart.defined ? { ...chart, points: chart.points.map((p, i) => ({ ...p, ...details[i]! })) } : chart,
    notes: [
      ...TREND_BASIS_NOTES,
      series === 'batch' ? 'Each point is one model\'s mean over its sites at the stage, so readings on one model do not inflate the count.' : 'Each point is one reading; sites of the model are interleaved by time.',
    ],
  };
}

export type ControlChartAnswer = Awaited<ReturnType<typeof readControlChart>>;
