import { DomainError } from '../../../src/errors/DomainError.ts';
import type { AmendRunInput } from '../../inputs/annealing.ts';
import type { Db } from '../../Db.ts';
import type { Actor } from '../Actor.ts';
import { getRun } from './getRun.ts';
import { recordRun } from './recordRun.ts';

/**
 * A corrected run record that supersedes the old one. The oven log stays with the run it was
 * imported for; import it again against the amended run if it belongs there.
 */
export async function amendRun(db: Db, actor: Actor, runId: string, input: AmendRunInput) {
  const { reason, ...run } = input;
  return db.transaction(async (tx) => {
    const previous = await getRun(tx, actor, runId);
    if (previous.supersededById) {
      throw new DomainError('conflict', `Run ${runId} was already amended by ${previous.supersededById}; amend that one.`, [{ field: 'id', message: `superseded by ${previous.supersededById}` }]);
    }
    return recordRun(tx, actor, run, { runId, reason });
  });
}
