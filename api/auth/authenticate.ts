import type { MiddlewareHandler } from 'hono';
import { getCookie } from 'hono/cookie';
import { findActorByKey } from '../../db/operations/keys/findActorByKey.ts';
import type { AppEnv } from '../AppEnv.ts';
import { problemResponse } from '../problem/problemResponse.ts';
import { clientAddress } from './clientAddress.ts';
import type { FailedKeyLimiter } from './failedKeyLimiter.ts';

export const SESSION_COOKIE = 'fl_key';

function presentedSecret(authorization: string | undefined, cookie: string | undefined): string | undefined {
  const match = authorization?.match(/^Bearer\s+(\S+)$/i);
  return match?.[1] ?? cookie;
}

/**
 * Resolves the bearer key (or the pages' cookie) to an actor. Unknown, malformed and revoked
 * keys get the same answer so the response tells a guesser nothing; each one counts against the
 * client's address, and an address past its limit gets 429 before any key is looked at.
 */
export function authenticate(limiter: FailedKeyLimiter): MiddlewareHandler<AppEnv> {
  return async (c, next) => {
    const address = clientAddress(c);
    const waitS = limiter.retryAfterS(address);
    if (waitS > 0) {
      return problemResponse(429, 'rate_limited', `Too many wrong keys from this address; try again in ${waitS} s.`, undefined, { 'retry-after': String(waitS) });
    }
    const secret = presentedSecret(c.req.header('authorization'), getCookie(c, SESSION_COOKIE));
    const actor = secret && secret.length <= 200 ? await findActorByKey(c.var.db, secret) : undefined;
    if (secret && !actor) limiter.recordFailure(address);
    if (!actor) {
      return problemResponse(401, 'unauthorized', 'Send a valid API key as "Authorization: Bearer <key>".', undefined, {
        'www-authenticate': 'Bearer realm="fringe-ledger"',
      });
    }
    c.set('actor', actor);
    await next();
  };
}
