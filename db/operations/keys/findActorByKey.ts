import { and, eq, isNull } from 'drizzle-orm';
import type { Db } from '../../Db.ts';
import { apiKeys } from '../../schema/index.ts';
import type { Actor } from '../Actor.ts';
import { hashApiKey } from './hashApiKey.ts';

/** The actor behind a presented secret, or undefined for an unknown or revoked key. */
export async function findActorByKey(db: Db, secret: string): Promise<Actor | undefined> {
  const [row] = await db
    .select({ keyId: apiKeys.id, labId: apiKeys.labId, role: apiKeys.role })
    .from(apiKeys)
    .where(and(eq(apiKeys.keyHash, hashApiKey(secret)), isNull(apiKeys.revokedAt)))
    .limit(1);
  return row;
}
