import type { RecommendationQuery } from '../../inputs/annealing.ts';
import type { Db } from '../../Db.ts';
import type { Actor } from '../Actor.ts';
import { analyseModelResiduals } from '../analysis/analyseModelResiduals.ts';
import { effectivenessHistory } from './effectivenessHistory.ts';
import { getModelMaterial } from './getModelMaterial.ts';
import { planForModel } from './planForModel.ts';

const WHY: Record<string, string> = {
  needs_annealing: 'At least one site is over its residual limit beyond the measurement uncertainty: anneal before testing.',
  undecided: 'At least one site is within its uncertainty of the limit: re-read it, or anneal to be sure.',
  conforming: 'Every site read is within its residual limit: annealing is not needed for fitness to test.',
  no_readings: 'No reading without load yet: read the critical sites before deciding.',
};

/**
 * Whether a model needs annealing (the residual analysis's decision), the cycle for its
 * material and thickness (house cycle, else the published default) as a plan that is shown,
 * not stored, and what that cycle has achieved on this material in the lab before.
 */
export async function annealingRecommendation(db: Db, actor: Actor, modelId: string, query: RecommendationQuery) {
  const { material } = await getModelMaterial(db, actor, modelId);
  const analysis = await analyseModelResiduals(db, actor, modelId);
  const draft = await planForModel(db, actor, modelId, query.maxSectionThicknessMm === undefined ? {} : { maxSectionThicknessMm: query.maxSectionThicknessMm });
  const [history] = await effectivenessHistory(db, actor, { windowH: query.windowH, guidanceKey: draft.entry.key, materialId: material.id });
  const record = history
    ? `${history.runs} run(s) of ${draft.entry.key} on ${material.name}: ${history.modelsWithinLimit} of ${history.modelsMeasured} model(s) read afterwards came out within their limit` +
      (history.medianRelief === null ? '.' : `; median relief ${(history.medianRelief * 100).toFixed(0)} %.`)
    : `No earlier run of ${draft.entry.key} on ${material.name} in this lab has readings before and after.`;
  return {
    model: analysis.model,
    materialFamily: material.family,
    decision: analysis.decision,
    needsAnnealing: analysis.decision === 'needs_annealing' ? true : analysis.decision === 'conforming' ? false : null,
    why: WHY[analysis.decision],
    limits: analysis.limits,
    sites: analysis.sites.map((s) => ({ siteId: s.siteId, label: s.label, decision: s.decision, current: s.current && { readingId: s.current.readingId, stage: s.current.stage, observedAt: s.current.observedAt, order: s.current.order } })),
    cycle: { guidanceEntryId: draft.entry.id, key: draft.entry.key, title: draft.entry.title, origin: draft.entry.origin, catalogueVersion: draft.entry.catalogueVersion, chosenBy: draft.chosenBy },
    maxSectionThicknessMm: draft.thicknessMm,
    thicknessSource: draft.thicknessSource,
    plan: draft.plan,
    history: history ?? null,
    historySummary: record,
    cautions: draft.plan.cautions,
  };
}
