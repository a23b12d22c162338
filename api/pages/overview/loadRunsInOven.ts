import { getRun } from '../../../db/operations/annealing/getRun.ts';
import { listRuns } from '../../../db/operations/annealing/listRuns.ts';
import type { Actor } from '../../../db/operations/Actor.ts';
import type { Db } from '../../../db/Db.ts';

const DAY_MS = 86_400_000;
// No schedule of this trade runs longer than a few weeks; older runs cannot still be in the oven.
const LOOK_BACK_DAYS = 45;
const MAX_RUNS_SHOWN = 20;

export interface RunInOven {
  id: string;
  ovenName: string;
  startedAt: Date;
  plannedEndAt: Date;
  modelCodes: string[];
  planId: string;
  status: 'scheduled' | 'in_oven' | 'awaiting_log';
}

/**
 * Runs not started yet, runs whose planned cycle is still going, and finished runs with no oven log imported yet
 * (the oven's record is the only proof of what the models went through).
 */
export async function loadRunsInOven(db: Db, actor: Actor, now: Date): Promise<RunInOven[]> {
  const found: RunInOven[] = [];
  let cursor: string | undefined;
  do {
    const page = await listRuns(db, actor, { limit: 200, cursor });
    for (const r of page.items) {
      if (r.supersededById || r.startedAt.getTime() < now.getTime() - LOOK_BACK_DAYS * DAY_MS || found.length >= MAX_RUNS_SHOWN) continue;
      const run = await getRun(db, actor, r.id);
      const status = now < run.startedAt ? 'scheduled' : now < run.plannedEndAt ? 'in_oven' : 'awaiting_log';
      if (status === 'awaiting_log' && run.currentLog) continue;
      found.push({ id: run.id, ovenName: run.ovenName, startedAt: run.startedAt, plannedEndAt: run.plannedEndAt, modelCodes: run.models.map((m) => m.code), planId: run.plan.id, status });
    }
    cursor = page.nextCursor ?? undefined;
  } while (cursor);
  return found;
}
