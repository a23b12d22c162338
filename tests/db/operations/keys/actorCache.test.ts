import { describe, expect, it } from 'vitest';
import { ACTOR_CACHE_SECONDS, actorCache } from '../../../../db/operations/keys/actorCache.ts';

const actor = { labId: 'lab-1', keyId: 'key-1', role: 'viewer' as const };

describe('actorCache', () => {
  it('returns a resolved key until it expires, then asks again', () => {
    actorCache.set('hash-a', actor, 1_000);
    expect(actorCache.get('hash-a', 1_000 + ACTOR_CACHE_SECONDS * 1000 - 1)).toEqual(actor);
    expect(actorCache.get('hash-a', 1_000 + ACTOR_CACHE_SECONDS * 1000)).toBeUndefined();
  });

  it('forgets a key at once when it is revoked', () => {
    actorCache.set('hash-b', { ...actor, keyId: 'key-2' });
    actorCache.forgetKey('key-2');
    expect(actorCache.get('hash-b')).toBeUndefined();
  });
});
