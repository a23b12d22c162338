import type { Actor } from '../Actor.ts';

/**
 * Seconds a resolved key is trusted without asking the database again. Every request
 * authenticates, so this halves the round trips of a read; a revocation made through this
 * process takes effect at once, one made by another process within this many seconds.
 */
export const ACTOR_CACHE_SECONDS = 5;
const MAX_ENTRIES = 10_000;

const entries = new Map<string, { actor: Actor; expiresAt: number }>();

export const actorCache = {
  get(keyHash: string, now = Date.now()): Actor | undefined {
    const hit = entries.get(keyHash);
    if (!hit) return undefined;
    if (hit.expiresAt > now) return hit.actor;
    entries.delete(keyHash);
    return undefined;
  },
  set(keyHash: string, actor: Actor, now = Date.now()): void {
    // Insertion order makes the first key the oldest, so a full cache sheds its stalest entry.
    if (entries.size >= MAX_ENTRIES) entries.delete(entries.keys().next().value as string);
    entries.set(keyHash, { actor, expiresAt: now + ACTOR_CACHE_SECONDS * 1000 });
  },
  forgetKey(keyId: string): void {
    for (const [hash, entry] of entries) if (entry.actor.keyId === keyId) entries.delete(hash);
  },
};
