import type { MiddlewareHandler } from 'hono';
import { getCookie } from 'hono/cookie';
import { findActorByKey } from '../../db/operations/keys/findActorByKey.ts';
import type { AppEnv } from '../AppEnv.ts';
import { problemResponse } from '../problem/problemResponse.ts';

export const SESSION_COOKIE = 'fl_key';

function presentedSecret(authorization: string | undefined, cookie: string | undefined): string | undefined {
  const match = authorization?.match(/^Bearer\s+(\S+)$/i);
  return match?.[1] ?? cookie;
}

/**
 * Resolves the bearer key (or the pages' cookie) to an actor. Unknown, malformed and revoked
 * keys get the same answer so the response tells a guesser nothing.
 */
export function authenticate(): MiddlewareHandler<AppEnv> {
  return async (c, next) => {
    const secret = presentedSecret(c.req.header('authorization'), getCookie(c, SESSION_COOKIE));
    const actor = secret && secret.length <= 200 ? await findActorByKey(c.var.db, secret) : undefined;
    if (!actor) {
      return problemResponse(401, 'unauthorized', 'Send a valid API key as "Authorization: Bearer <key>".', undefined, {
        'www-authenticate': 'Bearer realm="fringe-ledger"',
      });
    }
    c.set('actor', actor);
    await next();
  };
}
