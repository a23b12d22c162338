import { and, asc, desc, eq, isNull } from 'drizzle-orm';
import { ANNEALING_GUIDANCE_CATALOGUE } from '../../../src/annealing/guidanceCatalogue.ts';
import { DomainError } from '../../../src/errors/DomainError.ts';
import type { Db } from '../../Db.ts';
import { annealingGuidanceEntries, annealingHouseCycles } from '../../schema/index.ts';
import type { Actor } from '../Actor.ts';
import type { GuidanceEntryView } from './GuidanceEntryView.ts';
import { currentVersionOf } from './currentVersionOf.ts';
import { ensurePublishedGuidance } from './ensurePublishedGuidance.ts';
import { getGuidanceEntry } from './getGuidanceEntry.ts';
import type { MaterialFamily } from './guidanceFamilies.ts';

export type ChosenBy = 'requested' | 'house_cycle' | 'published_default';

/**
 * The entry to plan with: the one asked for, else the lab's house cycle for the family (its
 * newest amendment, so correcting the entry needs no new mark), else the first published
 * entry of the family in catalogue order.
 */
export async function chooseGuidanceEntry(db: Db, actor: Actor, family: MaterialFamily, requestedId?: string): Promise<{ entry: GuidanceEntryView; chosenBy: ChosenBy }> {
  await ensurePublishedGuidance(db);
  if (requestedId) {
    const entry = await getGuidanceEntry(db, actor, requestedId);
    if (entry.materialFamily !== family) {
      throw new DomainError('invalid_input', `Entry ${entry.key} is guidance for ${entry.materialFamily}; the model is ${family}.`, [{ field: 'guidanceEntryId', message: `an entry for ${entry.materialFamily}` }]);
    }
    if (entry.supersededById) {
      throw new DomainError('conflict', `Entry ${entry.id} was amended by ${entry.supersededById}; plan with the current version.`, [{ field: 'guidanceEntryId', message: `superseded by ${entry.supersededById}` }]);
    }
    return { entry, chosenBy: 'requested' };
  }
  const h = annealingHouseCycles;
  const [mark] = await db.select().from(h).where(and(eq(h.labId, actor.labId), eq(h.materialFamily, family))).orderBy(desc(h.markNumber)).limit(1);
  if (mark) return { entry: await getGuidanceEntry(db, actor, await currentVersionOf(db, mark.guidanceEntryId)), chosenBy: 'house_cycle' };
  const g = annealingGuidanceEntries;
  const [published] = await db
    .select({ id: g.id })
    .from(g)
    .where(and(isNull(g.labId), eq(g.catalogueVersion, ANNEALING_GUIDANCE_CATALOGUE.version), eq(g.materialFamily, family)))
    .orderBy(asc(g.cataloguePosition))
    .limit(1);
  if (!published) {
    throw new DomainError('invalid_input', `There is no published annealing guidance for ${family}; add a lab entry and mark it as the house cycle, or name one.`, [{ field: 'guidanceEntryId', message: `no guidance for ${family}` }]);
  }
  return { entry: await getGuidanceEntry(db, actor, published.id), chosenBy: 'published_default' };
}
