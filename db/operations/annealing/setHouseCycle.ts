import { DomainError } from '../../../src/errors/DomainError.ts';
import type { SetHouseCycleInput } from '../../inputs/annealing.ts';
import type { Db } from '../../Db.ts';
import { annealingHouseCycles } from '../../schema/index.ts';
import type { Actor } from '../Actor.ts';
import { getGuidanceEntry } from './getGuidanceEntry.ts';

/** Marks an entry as the lab's house cycle for a family; earlier marks stay as history. */
export async function setHouseCycle(db: Db, actor: Actor, input: SetHouseCycleInput) {
  return db.transaction(async (tx) => {
    const entry = await getGuidanceEntry(tx, actor, input.guidanceEntryId);
    if (entry.materialFamily !== input.materialFamily) {
      throw new DomainError('invalid_input', `Entry ${entry.key} is guidance for ${entry.materialFamily}, not ${input.materialFamily}.`, [{ field: 'guidanceEntryId', message: `an entry for ${entry.materialFamily}` }]);
    }
    if (entry.supersededById) {
      throw new DomainError('conflict', `Entry ${entry.id} was amended by ${entry.supersededById}; mark the current version.`, [{ field: 'guidanceEntryId', message: `superseded by ${entry.supersededById}` }]);
    }
    const [row] = await tx
      .insert(annealingHouseCycles)
      .values({ labId: actor.labId, materialFamily: input.materialFamily, guidanceEntryId: entry.id, reason: input.reason, recordedByKeyId: actor.keyId })
      .returning();
    return { ...row!, guidanceKey: entry.key, guidanceTitle: entry.title };
  });
}
