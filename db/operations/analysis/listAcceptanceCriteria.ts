import { and, desc, eq } from 'drizzle-orm';
import type { Db } from '../../Db.ts';
import { acceptanceCriteria } from '../../schema/index.ts';
import type { Actor } from '../Actor.ts';

/** The history of limits for a model or a project, newest (the one in force) first. */
export async function listAcceptanceCriteria(db: Db, actor: Actor, scope: { modelId?: string | undefined; project?: string | undefined }) {
  return db
    .select()
    .from(acceptanceCriteria)
    .where(
      and(
        eq(acceptanceCriteria.labId, actor.labId),
        scope.modelId ? eq(acceptanceCriteria.modelId, scope.modelId) : undefined,
        scope.project ? eq(acceptanceCriteria.project, scope.project) : undefined,
      ),
    )
    .orderBy(desc(acceptanceCriteria.createdAt), desc(acceptanceCriteria.id))
    .limit(200);
}
