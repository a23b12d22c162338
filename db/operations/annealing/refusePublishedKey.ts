import { and, eq, isNull } from 'drizzle-orm';
import { DomainError } from '../../../src/errors/DomainError.ts';
import type { Db } from '../../Db.ts';
import { annealingGuidanceEntries } from '../../schema/index.ts';

/** A lab entry may not take a published key: a plan's key must name one content only. */
export async function refusePublishedKey(db: Db, key: string): Promise<void> {
  const t = annealingGuidanceEntries;
  const [published] = await db.select({ id: t.id }).from(t).where(and(isNull(t.labId), eq(t.key, key))).limit(1);
  if (published) {
    throw new DomainError('conflict', `The key ${key} belongs to a published entry, which cannot be replaced; give the lab's entry its own key.`, [
      { field: 'entry.key', message: 'already used by a published entry' },
    ]);
  }
}
