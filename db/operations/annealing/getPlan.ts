import { and, eq } from 'drizzle-orm';
import { DomainError } from '../../../src/errors/DomainError.ts';
import type { Db } from '../../Db.ts';
import { annealingPlans } from '../../schema/index.ts';
import type { Actor } from '../Actor.ts';
import { type PlanView, planViewOf } from './PlanView.ts';

export async function getPlan(db: Db, actor: Actor, id: string): Promise<PlanView> {
  const t = annealingPlans;
  const [row] = await db.select().from(t).where(and(eq(t.id, id), eq(t.labId, actor.labId)));
  if (!row) throw new DomainError('not_found', `No annealing plan ${id} in this lab.`);
  const [successor] = await db.select({ id: t.id }).from(t).where(eq(t.supersedesId, id));
  return planViewOf(row, successor?.id ?? null);
}
