import { and, desc, eq, isNull } from 'drizzle-orm';
import type { Db } from '../../Db.ts';
import { acceptanceCriteria } from '../../schema/index.ts';

export type CriteriaRow = typeof acceptanceCriteria.$inferSelect;

/** The newest limits set for the model, else for its project, else none. */
export async function criteriaInForce(db: Db, labId: string, modelId: string, project: string | null): Promise<CriteriaRow | null> {
  const [forModel] = await db
    .select()
    .from(acceptanceCriteria)
    .where(and(eq(acceptanceCriteria.labId, labId), eq(acceptanceCriteria.modelId, modelId)))
    .orderBy(desc(acceptanceCriteria.createdAt), desc(acceptanceCriteria.id))
    .limit(1);
  if (forModel) return forModel;
  if (!project) return null;
  const [forProject] = await db
    .select()
    .from(acceptanceCriteria)
    .where(and(eq(acceptanceCriteria.labId, labId), eq(acceptanceCriteria.project, project), isNull(acceptanceCriteria.modelId)))
    .orderBy(desc(acceptanceCriteria.createdAt), desc(acceptanceCriteria.id))
    .limit(1);
  return forProject ?? null;
}
