import { and, desc, eq, inArray, isNull, or } from 'drizzle-orm';
import type { Db } from '../../Db.ts';
import { acceptanceCriteria } from '../../schema/index.ts';

export type CriteriaRow = typeof acceptanceCriteria.$inferSelect;

/**
 * The limits in force for each model, in one query: the newest set for the model, else the
 * newest for its project, else none (null).
 */
export async function criteriaInForceFor(db: Db, labId: string, models: readonly { id: string; project: string | null }[]): Promise<Map<string, CriteriaRow | null>> {
  const modelIds = models.map((m) => m.id);
  const projects = [...new Set(models.flatMap((m) => (m.project ? [m.project] : [])))];
  const rows =
    modelIds.length === 0
      ? []
      : await db
          .select()
          .from(acceptanceCriteria)
          .where(
            and(
              eq(acceptanceCriteria.labId, labId),
              or(inArray(acceptanceCriteria.modelId, modelIds), projects.length > 0 ? and(isNull(acceptanceCriteria.modelId), inArray(acceptanceCriteria.project, projects)) : undefined),
            ),
          )
          .orderBy(desc(acceptanceCriteria.createdAt), desc(acceptanceCriteria.id));
  // Rows come newest first, so the first match is the one in force.
  return new Map(models.map((m) => [m.id, rows.find((r) => r.modelId === m.id) ?? (m.project ? rows.find((r) => r.modelId === null && r.project === m.project) : undefined) ?? null]));
}
