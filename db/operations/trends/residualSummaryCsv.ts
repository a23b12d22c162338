import { stringify } from 'csv-stringify/sync';
import type { Distribution, ResidualGroupSummary, ResidualSummary } from './summariseResiduals.ts';

const percentileName = (p: number) => `p${Number((p * 100).toPrecision(6))}`;

function distributionHeader(unit: string, percentiles: readonly number[]): string[] {
  return ['mean', 'sd', 'median', ...percentiles.map(percentileName)].map((s) => `${s}_${unit}`);
}

const distributionCells = (d: Distribution) => [d.mean, d.standardDeviation, d.median, ...d.percentiles.map((x) => x.value)];

/**
 * The residual summary as CSV: one row per group, then one row `scope = all` for every reading
 * together, with the same figures the JSON answer has. Empty cells are values that do not
 * exist (a standard deviation of one reading, a null key).
 *
 * @example
 * residualSummaryCsv(summary);
 * // "scope,group_by,group_key,stage,reading_count,model_count,mean_order_577nm,…\n
 * //  group,batch,PC-2026-07,before_load,12,3,0.081,…\nall,batch,,before_load,24,6,0.12,…\n"
 */
export function residualSummaryCsv(summary: ResidualSummary): string {
  const p = summary.percentilesRequested;
  const header = [
    'scope', 'group_by', 'group_key', 'stage', 'reading_count', 'model_count',
    ...distributionHeader(`order_${summary.referenceWavelengthNm}nm`, p),
    ...distributionHeader('stress_mpa', p),
    'limit_order', 'readings_over_limit', 'reading_share_over_limit', 'models_over_limit', 'model_share_over_limit',
    'first_observed_at', 'last_observed_at',
  ];
  const line = (scope: 'group' | 'all', g: ResidualGroupSummary) => [
    scope, summary.groupBy, g.key, summary.stage, g.readingCount, g.modelCount,
    ...distributionCells(g.fringeOrder577),
    ...distributionCells(g.stressMPa),
    summary.limit.fringeOrder, g.overLimit.readings, g.overLimit.readingShare, g.overLimit.models, g.overLimit.modelShare,
    g.firstObservedAt, g.lastObservedAt,
  ];
  return stringify([header, ...summary.groups.map((g) => line('group', g)), line('all', summary.total)]);
}
