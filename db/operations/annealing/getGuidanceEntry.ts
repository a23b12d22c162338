import { and, eq, isNull, or } from 'drizzle-orm';
import { DomainError } from '../../../src/errors/DomainError.ts';
import type { Db } from '../../Db.ts';
import { annealingGuidanceEntries } from '../../schema/index.ts';
import type { Actor } from '../Actor.ts';
import type { GuidanceEntryView } from './GuidanceEntryView.ts';
import { ensurePublishedGuidance } from './ensurePublishedGuidance.ts';

/** A published entry (of any catalogue version) or one of the lab's own; other labs' are not found. */
export async function getGuidanceEntry(db: Db, actor: Actor, id: string): Promise<GuidanceEntryView> {
  await ensurePublishedGuidance(db);
  const t = annealingGuidanceEntries;
  const [row] = await db.select().from(t).where(and(eq(t.id, id), or(isNull(t.labId), eq(t.labId, actor.labId))));
  if (!row) throw new DomainError('not_found', `No annealing guidance entry ${id} for this lab.`);
  const [successor] = await db.select({ id: t.id }).from(t).where(eq(t.supersedesId, id));
  return { ...row, origin: row.labId === null ? 'published' : 'lab', supersededById: successor?.id ?? null };
}
