import { and, asc, eq, isNull, or, sql } from 'drizzle-orm';
import { ANNEALING_GUIDANCE_CATALOGUE } from '../../../src/annealing/guidanceCatalogue.ts';
import type { GuidanceListQuery } from '../../inputs/annealing.ts';
import type { Db } from '../../Db.ts';
import { annealingGuidanceEntries } from '../../schema/index.ts';
import type { Actor } from '../Actor.ts';
import type { GuidanceEntryView } from './GuidanceEntryView.ts';
import { ensurePublishedGuidance } from './ensurePublishedGuidance.ts';

/** The current catalogue's published entries in catalogue order, then the lab's own entries. */
export async function listGuidanceEntries(db: Db, actor: Actor, query: GuidanceListQuery): Promise<GuidanceEntryView[]> {
  await ensurePublishedGuidance(db);
  const t = annealingGuidanceEntries;
  // The outer table is named in full: drizzle leaves columns of a one-table select unqualified,
  // and inside the subquery a bare "id" would be the subquery's own.
  const successor = sql<string | null>`(select s.id from annealing_guidance_entries s where s.supersedes_id = annealing_guidance_entries.id)`;
  const rows = await db
    .select({ row: t, supersededById: successor })
    .from(t)
    .where(
      and(
        or(and(isNull(t.labId), eq(t.catalogueVersion, ANNEALING_GUIDANCE_CATALOGUE.version)), eq(t.labId, actor.labId)),
        query.materialFamily ? eq(t.materialFamily, query.materialFamily) : undefined,
        query.includeSuperseded ? undefined : sql`not exists (select 1 from annealing_guidance_entries s where s.supersedes_id = annealing_guidance_entries.id)`,
      ),
    )
    .orderBy(sql`${t.labId} is not null`, asc(t.cataloguePosition), asc(t.createdAt), asc(t.id));
  return rows.map(({ row, supersededById }) => ({ ...row, origin: row.labId === null ? 'published' : 'lab', supersededById }));
}
