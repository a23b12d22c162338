import { listModelPlans } from '../../../db/operations/annealing/listModelPlans.ts';
import { listRuns } from '../../../db/operations/annealing/listRuns.ts';
import { planForModel } from '../../../db/operations/annealing/planForModel.ts';
import type { Actor } from '../../../db/operations/Actor.ts';
import type { Db } from '../../../db/Db.ts';
import { DomainError } from '../../../src/errors/DomainError.ts';

/**
 * The model's annealing side: its stored plans, and when it is not yet fit to test, the cycle
 * the lab's guidance would give it now (drafted, not stored). A material without guidance is
 * a reason shown on the page, not a failed page.
 */
export async function loadAnnealingAdvice(db: Db, actor: Actor, modelId: string, decision: string) {
  const plans = await listModelPlans(db, actor, modelId);
  const current = plans.filter((p) => !p.supersededById).at(-1) ?? null;
  // A model goes through the oven a handful of times; the first page is all of them in practice.
  const runs = (await listRuns(db, actor, { limit: 50, modelId })).items.filter((r) => !r.supersededById);
  if (decision === 'conforming' || decision === 'no_readings') return { plans, current, runs, draft: null, unavailable: null };
  try {
    return { plans, current, runs, draft: await planForModel(db, actor, modelId, {}), unavailable: null };
  } catch (error) {
    if (error instanceof DomainError) return { plans, current, runs, draft: null, unavailable: error.message };
    throw error;
  }
}

export type AnnealingAdvice = Awaited<ReturnType<typeof loadAnnealingAdvice>>;
