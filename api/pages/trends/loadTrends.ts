import type { Actor } from '../../../db/operations/Actor.ts';
import { readControlChart } from '../../../db/operations/trends/readControlChart.ts';
import { readEdgeAging } from '../../../db/operations/trends/readEdgeAging.ts';
import { summariseResiduals } from '../../../db/operations/trends/summariseResiduals.ts';
import type { Db } from '../../../db/Db.ts';
import { ControlChartQuery, EdgeAgingQuery, ResidualTrendQuery, TREND_STAGES, type TrendStage } from '../../../db/inputs/trends.ts';
import type { BoxGroup } from '../plots/BatchBoxPlot.tsx';
import type { EdgeAgingCurve } from '../plots/EdgeAgingPlot.tsx';

const BOX_PERCENTILES = [0.05, 0.25, 0.75, 0.95];

/** The trend page's three views, each from its trend operation, turned into plain plot data. */
export async function loadTrends(db: Db, actor: Actor, stageParam: string | undefined, batchParam: string | undefined) {
  const stage: TrendStage = (TREND_STAGES as readonly string[]).includes(stageParam ?? '') ? (stageParam as TrendStage) : 'before_load';
  const summary = await summariseResiduals(db, actor, ResidualTrendQuery.parse({ stage, groupBy: 'batch', p: BOX_PERCENTILES.join(',') }));
  const pct = (g: (typeof summary.groups)[number], p: number) => g.fringeOrder577.percentiles.find((x) => x.p === p)?.value ?? null;
  const groups: BoxGroup[] = summary.groups.map((g) => ({ key: g.key ?? '(none)', readingCount: g.readingCount, modelCount: g.modelCount, p05: pct(g, 0.05), q1: pct(g, 0.25), median: g.fringeOrder577.median, q3: pct(g, 0.75), p95: pct(g, 0.95) }));
  // By default the batch with the most models, the one whose chart has the most to say.
  const batch = groups.find((g) => g.key === batchParam)?.key ?? [...groups].sort((a, b) => b.modelCount - a.modelCount)[0]?.key;
  const chart = batch ? await readControlChart(db, actor, ControlChartQuery.parse({ batch, stage })) : null;
  const aging = await readEdgeAging(db, actor, EdgeAgingQuery.parse({}));
  const fit = aging.fit.defined ? aging.fit[aging.fit.chosen] : null;
  const forecast = fit?.forecast.reached === 'forecast' ? fit.forecast : null;
  const curve: EdgeAgingCurve | null = fit
    ? {
        timeScale: fit.timeScale,
        interceptOrder: fit.interceptOrder.value,
        slope: fit.timeScale === 'sqrtTime' ? fit.slopeOrderPerSqrtH.value : fit.slopeOrderPerH.value,
        testBeforeH: forecast?.testBeforeH.value ?? null,
        bandH: forecast?.band95H ?? null,
      }
    : null;
  return { stage, summary, groups, batch, chart, aging, curve };
}

export type TrendsData = Awaited<ReturnType<typeof loadTrends>>;
