import { and, asc, eq, sql } from 'drizzle-orm';
import type { RunListQuery } from '../../inputs/annealing.ts';
import type { Db } from '../../Db.ts';
import { annealingRuns } from '../../schema/index.ts';
import type { Actor } from '../Actor.ts';
import { afterCursor, toPage } from '../paging.ts';

/** The lab's runs by start time, optionally only those whose load held a given model. */
export async function listRuns(db: Db, actor: Actor, query: RunListQuery) {
  const r = annealingRuns;
  // The outer table is named in full: drizzle leaves columns of a one-table select unqualified,
  // and inside the subquery a bare "id" would be the subquery's own.
  const rows = await db
    .select({ run: r, supersededById: sql<string | null>`(select s.id from annealing_runs s where s.supersedes_id = annealing_runs.id)` })
    .from(r)
    .where(
      and(
        eq(r.labId, actor.labId),
        query.modelId ? sql`exists (select 1 from annealing_run_models m where m.run_id = annealing_runs.id and m.model_id = ${query.modelId})` : undefined,
        afterCursor(r.startedAt, r.id, query.cursor),
      ),
    )
    .orderBy(asc(r.startedAt), asc(r.id))
    .limit(query.limit + 1);
  const page = toPage(rows, query.limit, (x) => ({ at: x.run.startedAt, id: x.run.id }));
  return { items: page.items.map((x) => ({ ...x.run, supersededById: x.supersededById })), nextCursor: page.nextCursor };
}
