import { and, asc, eq, sql } from 'drizzle-orm';
import type { Db } from '../../Db.ts';
import { annealingPlans } from '../../schema/index.ts';
import type { Actor } from '../Actor.ts';
import { getModelMaterial } from './getModelMaterial.ts';
import { type PlanView, planViewOf } from './PlanView.ts';

/** Every plan made for a model, oldest first, superseded ones included and marked. */
export async function listModelPlans(db: Db, actor: Actor, modelId: string): Promise<PlanView[]> {
  await getModelMaterial(db, actor, modelId);
  const t = annealingPlans;
  // The outer table is named in full: drizzle leaves columns of a one-table select unqualified,
  // and inside the subquery a bare "id" would be the subquery's own.
  const successor = sql<string | null>`(select s.id from annealing_plans s where s.supersedes_id = annealing_plans.id)`;
  const rows = await db.select({ row: t, successor }).from(t).where(and(eq(t.labId, actor.labId), eq(t.modelId, modelId))).orderBy(asc(t.createdAt), asc(t.id));
  return rows.map(({ row, successor: s }) => planViewOf(row, s));
}
