import { asc, eq } from 'drizzle-orm';
import type { Db } from '../../Db.ts';
import { apiKeys } from '../../schema/index.ts';
import type { Actor } from '../Actor.ts';

export async function listApiKeys(db: Db, actor: Actor) {
  return db
    .select({ id: apiKeys.id, label: apiKeys.label, role: apiKeys.role, keyPrefix: apiKeys.keyPrefix, createdAt: apiKeys.createdAt, revokedAt: apiKeys.revokedAt })
    .from(apiKeys)
    .where(eq(apiKeys.labId, actor.labId))
    .orderBy(asc(apiKeys.createdAt), asc(apiKeys.id));
}
