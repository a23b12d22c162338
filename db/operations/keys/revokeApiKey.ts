import { and, eq, isNull } from 'drizzle-orm';
import { DomainError } from '../../../src/errors/DomainError.ts';
import type { Db } from '../../Db.ts';
import { apiKeys } from '../../schema/index.ts';
import type { Actor } from '../Actor.ts';
import { actorCache } from './actorCache.ts';

/** Revokes a key of the caller's lab; the caller's own key is kept so a lab is never locked out by mistake. */
export async function revokeApiKey(db: Db, actor: Actor, keyId: string) {
  if (keyId === actor.keyId) throw new DomainError('conflict', 'A key cannot revoke itself; use another admin key.');
  const [row] = await db
    .update(apiKeys)
    .set({ revokedAt: new Date() })
    .where(and(eq(apiKeys.id, keyId), eq(apiKeys.labId, actor.labId), isNull(apiKeys.revokedAt)))
    .returning({ id: apiKeys.id, label: apiKeys.label, role: apiKeys.role, keyPrefix: apiKeys.keyPrefix, createdAt: apiKeys.createdAt, revokedAt: apiKeys.revokedAt });
  if (!row) throw new DomainError('not_found', `No active key ${keyId} in this lab.`);
  actorCache.forgetKey(keyId);
  return row;
}
