import type { CreateReadingInput } from '../../inputs/readings.ts';
import type { Db } from '../../Db.ts';
import { readings } from '../../schema/index.ts';
import type { Actor } from '../Actor.ts';
import { getSite } from '../models/getSite.ts';
import { deriveReadingColumns } from './deriveReadingColumns.ts';
import { refuseImplausibleOrder } from './refuseImplausibleOrder.ts';

export async function recordReading(db: Db, actor: Actor, siteId: string, input: CreateReadingInput) {
  const columns = deriveReadingColumns(input);
  return db.transaction(async (tx) => {
    await getSite(tx, actor, siteId);
    await refuseImplausibleOrder(tx, actor, siteId, columns);
    const [row] = await tx
      .insert(readings)
      .values({ ...columns, siteId, labId: actor.labId, recordedByKeyId: actor.keyId })
      .returning();
    return row!;
  });
}
