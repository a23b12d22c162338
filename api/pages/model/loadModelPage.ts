import { analyseModelResiduals } from '../../../db/operations/analysis/analyseModelResiduals.ts';
import type { Actor } from '../../../db/operations/Actor.ts';
import { getModelDetail } from '../../../db/operations/models/getModelDetail.ts';
import { listSiteReadings } from '../../../db/operations/readings/listSiteReadings.ts';
import { readControlChart } from '../../../db/operations/trends/readControlChart.ts';
import type { Db } from '../../../db/Db.ts';
import { READING_STAGES } from '../../../db/inputs/readings.ts';
import { ControlChartQuery, TREND_STAGES } from '../../../db/inputs/trends.ts';
import { loadAnnealingAdvice } from './loadAnnealingAdvice.ts';

export const READINGS_PER_PAGE = 25;

export interface ModelPageQuery {
  siteId?: string | undefined;
  stage?: string | undefined;
  cursor?: string | undefined;
  chartStage?: string | undefined;
}

const oneOf = <T extends string>(values: readonly T[], v: string | undefined): T | undefined => (values as readonly string[]).includes(v ?? '') ? (v as T) : undefined;

/**
 * Everything the model page shows. The readings table is one page of one site (keyset paged),
 * so the page costs the same for ten readings or ten thousand; the chart is binned later.
 */
export async function loadModelPage(db: Db, actor: Actor, modelId: string, query: ModelPageQuery) {
  const detail = await getModelDetail(db, actor, modelId);
  const analysis = await analyseModelResiduals(db, actor, modelId);
  const site = detail.sites.find((s) => s.id === query.siteId) ?? detail.sites[0];
  const stage = oneOf(READING_STAGES, query.stage);
  const readings = site
    ? await listSiteReadings(db, actor, site.id, { limit: READINGS_PER_PAGE, cursor: query.cursor, stage, includeSuperseded: false })
    : { items: [], nextCursor: null };
  const chartStage = oneOf(TREND_STAGES, query.chartStage) ?? 'before_load';
  const chart = await readControlChart(db, actor, ControlChartQuery.parse({ modelId, stage: chartStage }));
  return { detail, analysis, site, stage, readings, chartStage, chart, advice: await loadAnnealingAdvice(db, actor, modelId, analysis.decision) };
}

export type ModelPageData = Awaited<ReturnType<typeof loadModelPage>>;
