import { analyseManyModelsResiduals } from '../../../db/operations/analysis/analyseManyModelsResiduals.ts';
import type { Actor } from '../../../db/operations/Actor.ts';
import { listModels } from '../../../db/operations/models/listModels.ts';
import type { Db } from '../../../db/Db.ts';
import type { DecisionName } from '../shell/DecisionBadge.tsx';
import { loadRunsInOven } from './loadRunsInOven.ts';

/** Models judged per page, all in one batched residual analysis. */
export const MODELS_PER_PAGE = 40;
const RECENT_READINGS = 12;

export interface OverviewModel {
  id: string;
  code: string;
  materialName: string;
  decision: DecisionName;
  siteCount: number;
  sitesOver: string[];
}

export interface RecentReading {
  modelId: string;
  modelCode: string;
  siteLabel: string;
  stage: string;
  observedAt: Date;
  order: { value: number; uncertainty: number };
  decision: DecisionName;
}

/**
 * What the lab overview shows: one page of models with their decisions, runs in the oven,
 * and the newest reading each site is judged on, all from the existing operations.
 */
export async function loadOverview(db: Db, actor: Actor, cursor: string | undefined, now = new Date()) {
  const page = await listModels(db, actor, { limit: MODELS_PER_PAGE, cursor });
  const models: OverviewModel[] = [];
  const recent: RecentReading[] = [];
  const analyses = await analyseManyModelsResiduals(db, actor, page.items.map((m) => m.id));
  for (const analysis of analyses) {
    const m = analysis.model;
    models.push({
      id: m.id,
      code: m.code,
      materialName: m.materialName,
      decision: analysis.decision,
      siteCount: analysis.sites.length,
      sitesOver: analysis.sites.filter((s) => s.decision === 'needs_annealing').map((s) => s.label),
    });
    for (const s of analysis.sites) {
      if (s.current) recent.push({ modelId: m.id, modelCode: m.code, siteLabel: s.label, stage: s.current.stage, observedAt: s.current.observedAt, order: s.current.order, decision: s.decision });
    }
  }
  recent.sort((a, b) => b.observedAt.getTime() - a.observedAt.getTime());
  return {
    models,
    nextCursor: page.nextCursor,
    awaiting: models.filter((m) => m.decision === 'no_readings' || m.decision === 'undecided'),
    needAnnealing: models.filter((m) => m.decision === 'needs_annealing'),
    fit: models.filter((m) => m.decision === 'conforming'),
    recent: recent.slice(0, RECENT_READINGS),
    runs: await loadRunsInOven(db, actor, now),
  };
}

export type Overview = Awaited<ReturnType<typeof loadOverview>>;
