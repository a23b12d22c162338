import type { AnnealingPlan } from '../../../src/annealing/AnnealingPlan.ts';
import type { annealingPlans } from '../../schema/index.ts';

export type PlanRow = typeof annealingPlans.$inferSelect;

/** A stored plan as answered: the record, the plan typed, and the cautions up front. */
export interface PlanView extends Omit<PlanRow, 'plan'> {
  plan: AnnealingPlan;
  supersededById: string | null;
  cautions: string[];
}

export function planViewOf(row: PlanRow, supersededById: string | null): PlanView {
  const plan = row.plan as unknown as AnnealingPlan;
  return { ...row, plan, supersededById, cautions: plan.cautions };
}
