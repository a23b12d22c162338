import { DomainError } from '../../../src/errors/DomainError.ts';
import type { AmendGuidanceEntryInput } from '../../inputs/annealing.ts';
import type { Db } from '../../Db.ts';
import { annealingGuidanceEntries } from '../../schema/index.ts';
import type { Actor } from '../Actor.ts';
import type { GuidanceEntryView } from './GuidanceEntryView.ts';
import { checkLabGuidanceEntry } from './checkLabGuidanceEntry.ts';
import { getGuidanceEntry } from './getGuidanceEntry.ts';

/**
 * A corrected version of one of the lab's entries, under the same key; the old one stays for
 * the plans made from it. Published entries are the repository's and no lab may change them.
 */
export async function amendGuidanceEntry(db: Db, actor: Actor, id: string, input: AmendGuidanceEntryInput): Promise<GuidanceEntryView> {
  return db.transaction(async (tx) => {
    const previous = await getGuidanceEntry(tx, actor, id);
    if (previous.origin === 'published') {
      throw new DomainError('forbidden', `Entry ${id} is published guidance (catalogue ${previous.catalogueVersion}): it is read-only. Add a lab entry with its own key and mark it as the house cycle instead.`);
    }
    if (previous.supersededById) {
      throw new DomainError('conflict', `Entry ${id} was already amended by ${previous.supersededById}; amend that one.`, [{ field: 'id', message: `superseded by ${previous.supersededById}` }]);
    }
    const { entry, family } = checkLabGuidanceEntry(input.entry, previous.materialFamily);
    if (entry.key !== previous.key) {
      throw new DomainError('invalid_input', 'An amendment keeps the key of the entry it corrects; different content under a new name is a new entry.', [{ field: 'entry.key', message: `must stay ${previous.key}` }]);
    }
    const [row] = await tx
      .insert(annealingGuidanceEntries)
      .values({ labId: actor.labId, key: entry.key, title: entry.title, materialFamily: family, entry: entry as unknown as Record<string, unknown>, supersedesId: id, amendmentReason: input.reason, recordedByKeyId: actor.keyId })
      .returning();
    return { ...row!, origin: 'lab', supersededById: null };
  });
}
