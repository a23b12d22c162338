import { and, desc, eq } from 'drizzle-orm';
import type { HouseCycleQuery } from '../../inputs/annealing.ts';
import type { Db } from '../../Db.ts';
import { annealingGuidanceEntries, annealingHouseCycles } from '../../schema/index.ts';
import type { Actor } from '../Actor.ts';

/** Every house-cycle mark of the lab, newest first, with whether it is the one in force. */
export async function listHouseCycles(db: Db, actor: Actor, query: HouseCycleQuery) {
  const h = annealingHouseCycles;
  const rows = await db
    .select({ mark: h, guidanceKey: annealingGuidanceEntries.key, guidanceTitle: annealingGuidanceEntries.title })
    .from(h)
    .innerJoin(annealingGuidanceEntries, eq(annealingGuidanceEntries.id, h.guidanceEntryId))
    .where(and(eq(h.labId, actor.labId), query.materialFamily ? eq(h.materialFamily, query.materialFamily) : undefined))
    .orderBy(desc(h.markNumber));
  const seen = new Set<string>();
  return rows.map(({ mark, guidanceKey, guidanceTitle }) => {
    const inForce = !seen.has(mark.materialFamily);
    seen.add(mark.materialFamily);
    return { ...mark, guidanceKey, guidanceTitle, inForce };
  });
}
