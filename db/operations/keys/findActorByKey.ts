import { and, eq, isNull } from 'drizzle-orm';
import type { Db } from '../../Db.ts';
import { apiKeys } from '../../schema/index.ts';
import type { Actor } from '../Actor.ts';
import { actorCache } from './actorCache.ts';
import { hashApiKey } from './hashApiKey.ts';

/** The actor behind a presented secret, or undefined for an unknown or revoked key. */
export async function findActorByKey(db: Db, secret: string): Promise<Actor | undefined> {
  const keyHash = hashApiKey(secret);
  const cached = actorCache.get(keyHash);
  if (cached) return cached;
  const [row] = await db
    .select({ keyId: apiKeys.id, labId: apiKeys.labId, role: apiKeys.role })
    .from(apiKeys)
    .where(and(eq(apiKeys.keyHash, keyHash), isNull(apiKeys.revokedAt)))
    .limit(1);
  if (row) actorCache.set(keyHash, row);
  return row;
}
