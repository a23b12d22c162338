import { sql } from 'drizzle-orm';
import { COMMON_PRACTICE_FITNESS_CRITERIA } from '../../../src/acceptance/commonPracticeFitnessCriteria.ts';
import { differenceOfOrders } from '../../../src/residual/differenceOfOrders.ts';
import { ratioOrUndefined } from '../../../src/residual/ratioOrUndefined.ts';
import type { Db } from '../../Db.ts';
import { rowsOf } from '../../rowsOf.ts';
import type { Actor } from '../Actor.ts';
import { annealOutcomesSql } from './annealOutcomesSql.ts';
import { getRun } from './getRun.ts';

interface OutcomeRow {
  model_id: string;
  model_code: string;
  site_id: string;
  site_label: string;
  before_id: string | null;
  before_order: number | null;
  before_u: number | null;
  before_at: string | Date | null;
  after_id: string | null;
  after_order: number | null;
  after_u: number | null;
  after_at: string | Date | null;
  limit_order: number;
  limit_source: string;
  coverage_factor: number;
  after_decision: 'conforming' | 'not_conforming' | 'undecided' | null;
}

const reading = (id: string | null, order: number | null, u: number | null, at: string | Date | null) =>
  id === null ? null : { readingId: id, fringeOrder: order!, uncertainty: u!, observedAt: new Date(at!).toISOString() };

/** A model is within its limit only if every site read after the run conforms. */
function modelVerdict(decisions: OutcomeRow['after_decision'][]): 'within_limit' | 'over_limit' | 'undecided' | 'not_measured' {
  const measured = decisions.filter((d) => d !== null);
  if (measured.length === 0) return 'not_measured';
  if (measured.includes('not_conforming')) return 'over_limit';
  return measured.every((d) => d === 'conforming') ? 'within_limit' : 'undecided';
}

/**
 * Anneal relief (N_pre − N_post)/N_pre at each site of each model in the run's load, with its
 * first-order uncertainty (cov = u(N_pre)², the shared reading), and whether each model came
 * out within its residual limit.
 */
export async function runEffectiveness(db: Db, actor: Actor, runId: string, windowH: number) {
  const run = await getRun(db, actor, runId);
  const rows = rowsOf<OutcomeRow>(await db.execute(sql`${annealOutcomesSql({ labId: actor.labId, windowH, runId })} select * from site_outcomes order by model_code, site_label`));
  const byModel = new Map<string, { modelId: string; modelCode: string; sites: ReturnType<typeof siteOf>[]; decisions: OutcomeRow['after_decision'][] }>();
  for (const r of rows) {
    const entry = byModel.get(r.model_id) ?? { modelId: r.model_id, modelCode: r.model_code, sites: [], decisions: [] };
    entry.sites.push(siteOf(r));
    entry.decisions.push(r.after_decision);
    byModel.set(r.model_id, entry);
  }
  const models = [...byModel.values()].map(({ decisions, ...m }) => ({ ...m, verdict: modelVerdict(decisions) }));
  const reliefs = models.flatMap((m) => m.sites.flatMap((s) => (s.relief.defined ? [s.relief.ratio.value] : [])));
  const usesCommonPractice = rows.some((r) => r.limit_source === 'common_practice');
  return {
    runId,
    planId: run.planId,
    guidanceKey: run.plan.guidanceKey,
    logVerdict: run.currentLog?.verdict ?? null,
    window: { beforeFrom: new Date(run.startedAt.getTime() - windowH * 3_600_000).toISOString(), startedAt: run.startedAt.toISOString(), plannedEndAt: run.plannedEndAt.toISOString(), afterUntil: new Date(run.plannedEndAt.getTime() + windowH * 3_600_000).toISOString(), windowH },
    models,
    summary: {
      sitesWithRelief: reliefs.length,
      meanRelief: reliefs.length > 0 ? reliefs.reduce((a, b) => a + b, 0) / reliefs.length : null,
      modelsMeasured: models.filter((m) => m.verdict !== 'not_measured').length,
      modelsWithinLimit: models.filter((m) => m.verdict === 'within_limit').length,
    },
    notes: [
      'Readings are fringe-order magnitudes; relief is taken on magnitudes.',
      'A site is within its limit only if N_after + k·u ≤ limit (ISO 14253-1 style guard band).',
      ...(usesCommonPractice ? [`Where no acceptance limit is set, ${COMMON_PRACTICE_FITNESS_CRITERIA.usual.maxResidualFringeOrder} fringe is used: ${COMMON_PRACTICE_FITNESS_CRITERIA.flag}.`] : []),
    ],
  };
}

function siteOf(r: OutcomeRow) {
  const before = reading(r.before_id, r.before_order, r.before_u, r.before_at);
  const after = reading(r.after_id, r.after_order, r.after_u, r.after_at);
  const relief =
    before && after
      ? ratioOrUndefined(differenceOfOrders({ value: before.fringeOrder, uncertainty: before.uncertainty }, { value: after.fringeOrder, uncertainty: after.uncertainty }), { value: before.fringeOrder, uncertainty: before.uncertainty }, { covariance: before.uncertainty ** 2, coverageFactor: r.coverage_factor })
      : { defined: false as const, reason: before ? 'no after_anneal reading in the window after the run' : 'no before_anneal reading in the window before the run' };
  return { siteId: r.site_id, siteLabel: r.site_label, before, after, relief, limitFringeOrder: r.limit_order, limitSource: r.limit_source, coverageFactor: r.coverage_factor, afterDecision: r.after_decision };
}
