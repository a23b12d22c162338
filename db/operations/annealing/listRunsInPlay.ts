import { and, asc, eq, gte, sql } from 'drizzle-orm';
import type { Db } from '../../Db.ts';
import { annealingPlans, annealingRuns } from '../../schema/index.ts';
import type { Actor } from '../Actor.ts';

export interface RunInPlay {
  id: string;
  ovenName: string;
  startedAt: Date;
  plannedEndAt: Date;
  planId: string;
  modelCodes: string[];
  status: 'scheduled' | 'in_oven' | 'awaiting_log';
}

const HOUR_MS = 3_600_000;

/**
 * Current runs started since `since` that still need someone: not started yet, with the
 * planned cycle still going, or over with no oven log imported (the oven's record is the only
 * proof of what the models went through). Oldest first, at most `limit`, in one query.
 */
export async function listRunsInPlay(db: Db, actor: Actor, { now, since, limit }: { now: Date; since: Date; limit: number }): Promise<RunInPlay[]> {
  const r = annealingRuns;
  // Raw subqueries name the outer table in full: drizzle leaves one-table columns unqualified.
  const hasLog = sql`exists (select 1 from oven_logs l where l.run_id = annealing_runs.id and not exists (select 1 from oven_logs s where s.supersedes_id = l.id))`;
  const plannedEnd = sql`annealing_runs.started_at + ${annealingPlans.totalDurationH} * interval '1 hour'`;
  const rows = await db
    .select({
      id: r.id,
      ovenName: r.ovenName,
      startedAt: r.startedAt,
      planId: r.planId,
      totalDurationH: annealingPlans.totalDurationH,
      modelCodes: sql<string[]>`coalesce((select array_agg(m.code order by m.code) from annealing_run_models rm join models m on m.id = rm.model_id where rm.run_id = annealing_runs.id), '{}')`,
    })
    .from(r)
    .innerJoin(annealingPlans, eq(annealingPlans.id, r.planId))
    .where(
      and(
        eq(r.labId, actor.labId),
        gte(r.startedAt, since),
        sql`not exists (select 1 from annealing_runs s where s.supersedes_id = annealing_runs.id)`,
        sql`not (${plannedEnd} <= ${now.toISOString()}::timestamptz and ${hasLog})`,
      ),
    )
    .orderBy(asc(r.startedAt), asc(r.id))
    .limit(limit);
  return rows.map(({ totalDurationH, ...run }) => {
    const plannedEndAt = new Date(run.startedAt.getTime() + totalDurationH * HOUR_MS);
    return { ...run, plannedEndAt, status: now < run.startedAt ? 'scheduled' : now < plannedEndAt ? 'in_oven' : 'awaiting_log' };
  });
}
