import { fitEdgeAging } from '../../../src/statistics/fitEdgeAging.ts';
import type { Db } from '../../Db.ts';
import { DEFAULT_LIMIT_ORDER, type EdgeAgingQuery } from '../../inputs/trends.ts';
import { rowsOf } from '../../rowsOf.ts';
import type { Actor } from '../Actor.ts';
import { edgeAgingPointsSql, storedModelsSql } from './edgeAgingSql.ts';
import { forecastStoredModels, type StoredModel } from './forecastStoredModels.ts';
import { REFERENCE_WAVELENGTH_NM, TREND_BASIS_NOTES } from './trendReadingsSql.ts';

interface PointRow {
  hours: number | null;
  value: number;
  model_id: string;
  material_name: string;
}

interface StoredRow {
  model_id: string;
  model_code: string;
  machining_method: string | null;
  machined_at: string;
  machined_ms: number;
  latest_order: number | null;
  latest_observed_at: string | null;
}

/**
 * Edge residual against storage time since machining (time-edge effect), fitted by
 * fitEdgeAging over the filtered population, and a "test before" date for each model still
 * in storage from that pooled curve and the model's own machining time.
 *
 * @example
 * await readEdgeAging(db, actor, { stage: 'inspection', sites: 'machined_edge', batch: 'PC-2026-07', forecastLimit: 100 });
 * // { pointCount: 42, modelCount: 6, fit: { defined: true, chosen: 'sqrtTime', forecast: { reached: 'forecast', testBeforeH: { value: 310, … } } },
 * //   storedModels: [{ modelCode: 'UN-09', status: 'forecast', testBeforeAt: '2026-12-03T10:00:00.000Z', hoursRemaining: 122, … }], … }
 */
export async function readEdgeAging(db: Db, actor: Actor, query: EdgeAgingQuery) {
  const limitOrder = query.limitOrder ?? DEFAULT_LIMIT_ORDER;
  const atMs = query.at ? Date.parse(query.at) : Date.now();
  const [pointResult, storedResult] = await Promise.all([db.execute(edgeAgingPointsSql(actor.labId, query)), db.execute(storedModelsSql(actor.labId, query))]);
  const rows = rowsOf<PointRow>(pointResult);
  // A reading taken before any recorded machining has no age; it cannot sit on the time axis.
  const placed = rows.filter((r) => r.hours !== null && Number(r.hours) >= 0);
  const fit = fitEdgeAging(
    placed.map((r) => ({ hoursSinceMachining: Number(r.hours), residualOrder: Number(r.value) })),
    { limitOrder },
  );
  const stored = rowsOf<StoredRow>(storedResult).map(
    (r): StoredModel => ({
      modelId: r.model_id,
      modelCode: r.model_code,
      machiningMethod: r.machining_method,
      machinedAt: r.machined_at,
      machinedMs: Number(r.machined_ms),
      latestOrder: r.latest_order === null ? null : Number(r.latest_order),
      latestObservedAt: r.latest_observed_at,
    }),
  );
  const forecasts = forecastStoredModels(stored, fit.defined ? fit.forecast : null, limitOrder, atMs);
  const materials = new Set(placed.map((r) => r.material_name));
  const warnings = materials.size > 1 ? [`the fit pools ${materials.size} materials, which age differently: filter by material or batch`] : [];
  const { limitOrder: _given, at: _at, forecastLimit, sites, stage, ...filters } = query;
  return {
    stage,
    sites,
    filters,
    at: new Date(atMs).toISOString(),
    limit: {
      fringeOrder: limitOrder,
      source: query.limitOrder === undefined ? `default ${DEFAULT_LIMIT_ORDER} fringe, common practice (not a standard)` : 'given in the query',
    },
    unit: `fringe order at ${REFERENCE_WAVELENGTH_NM} nm against hours since the latest machining before each reading`,
    pointCount: placed.length,
    readingCount: placed.length,
    modelCount: new Set(placed.map((r) => r.model_id)).size,
    readingsWithoutMachining: rows.length - placed.length,
    fit,
    storedModelCount: forecasts.length,
    storedModels: forecasts.slice(0, forecastLimit),
    warnings,
    notes: [
      ...TREND_BASIS_NOTES,
      sites === 'machined_edge' ? 'Sites: those of kind machined_edge.' : 'Sites: all sites on a free edge.',
      'A model is still stored when its latest event other than an inspection is "stored". Its test-before date is its latest machining plus the pooled curve\'s crossing time; its own readings only decide "over_limit".',
    ],
  };
}
