import type { CreateGuidanceEntryInput } from '../../inputs/annealing.ts';
import type { Db } from '../../Db.ts';
import { annealingGuidanceEntries } from '../../schema/index.ts';
import type { Actor } from '../Actor.ts';
import type { GuidanceEntryView } from './GuidanceEntryView.ts';
import { checkLabGuidanceEntry } from './checkLabGuidanceEntry.ts';
import { ensurePublishedGuidance } from './ensurePublishedGuidance.ts';
import { refusePublishedKey } from './refusePublishedKey.ts';

/** Adds one of the lab's own guidance entries beside the published ones. */
export async function createGuidanceEntry(db: Db, actor: Actor, input: CreateGuidanceEntryInput): Promise<GuidanceEntryView> {
  const { entry, family } = checkLabGuidanceEntry(input.entry, input.appliesToFamily);
  return db.transaction(async (tx) => {
    await ensurePublishedGuidance(tx);
    await refusePublishedKey(tx, entry.key);
    const [row] = await tx
      .insert(annealingGuidanceEntries)
      .values({ labId: actor.labId, key: entry.key, title: entry.title, materialFamily: family, entry: entry as unknown as Record<string, unknown>, recordedByKeyId: actor.keyId })
      .returning();
    return { ...row!, origin: 'lab', supersededById: null };
  });
}
