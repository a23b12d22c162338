import { asc, eq } from 'drizzle-orm';
import type { Db } from '../../Db.ts';
import { calibrations } from '../../schema/index.ts';
import type { Actor } from '../Actor.ts';
import { getBatch } from '../materials/getBatch.ts';

/** A batch's calibrations, oldest first (a batch has a handful, so no paging). */
export async function listCalibrations(db: Db, actor: Actor, batchId: string) {
  await getBatch(db, actor, batchId);
  return db.select().from(calibrations).where(eq(calibrations.batchId, batchId)).orderBy(asc(calibrations.observedAt), asc(calibrations.id));
}
