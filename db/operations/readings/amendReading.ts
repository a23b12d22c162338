import type { AmendReadingInput } from '../../inputs/readings.ts';
import { DomainError } from '../../../src/errors/DomainError.ts';
import type { Db } from '../../Db.ts';
import { readings } from '../../schema/index.ts';
import type { Actor } from '../Actor.ts';
import { deriveReadingColumns } from './deriveReadingColumns.ts';
import { getReading } from './getReading.ts';
import { refuseImplausibleOrder } from './refuseImplausibleOrder.ts';

/**
 * Records a correction as a new reading that supersedes the old one; the old one stays as it
 * was. Only the current reading of a chain can be amended, and the unique index on
 * supersedes_id makes the loser of two simultaneous amendments fail with a conflict.
 */
export async function amendReading(db: Db, actor: Actor, readingId: string, input: AmendReadingInput) {
  const { reason, ...reading } = input;
  const columns = deriveReadingColumns(reading);
  return db.transaction(async (tx) => {
    const previous = await getReading(tx, actor, readingId);
    if (previous.supersededById) {
      throw new DomainError('conflict', `Reading ${readingId} was already amended by ${previous.supersededById}; amend that one.`, [
        { field: 'readingId', message: `superseded by ${previous.supersededById}` },
      ]);
    }
    await refuseImplausibleOrder(tx, actor, previous.siteId, columns);
    const [row] = await tx
      .insert(readings)
      .values({
        ...columns,
        siteId: previous.siteId,
        labId: actor.labId,
        supersedesId: previous.id,
        amendmentReason: reason,
        recordedByKeyId: actor.keyId,
      })
      .returning();
    return row!;
  });
}
