import { and, eq } from 'drizzle-orm';
import { DomainError } from '../../../src/errors/DomainError.ts';
import type { Db } from '../../Db.ts';
import { ovenLogs } from '../../schema/index.ts';
import type { Actor } from '../Actor.ts';
import { type OvenLogView, ovenLogViewOf } from './OvenLogView.ts';

export async function getOvenLog(db: Db, actor: Actor, id: string): Promise<OvenLogView> {
  const [row] = await db.select().from(ovenLogs).where(and(eq(ovenLogs.id, id), eq(ovenLogs.labId, actor.labId)));
  if (!row) throw new DomainError('not_found', `No oven log ${id} in this lab.`);
  const [successor] = await db.select({ id: ovenLogs.id }).from(ovenLogs).where(eq(ovenLogs.supersedesId, id));
  return ovenLogViewOf(row, successor?.id ?? null);
}
