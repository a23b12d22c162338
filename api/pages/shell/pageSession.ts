import type { MiddlewareHandler } from 'hono';
import { getCookie } from 'hono/cookie';
import { findActorByKey } from '../../../db/operations/keys/findActorByKey.ts';
import type { AppEnv } from '../../AppEnv.ts';
import { SESSION_COOKIE } from '../../auth/authenticate.ts';
import { safeNextPath } from './safeNextPath.ts';

/**
 * Signs page requests in from the HttpOnly key cookie. A reader without one is sent to the
 * sign-in page and brought back afterwards; a form post without one gets 401, since
 * replaying a post after a redirect would lose its body.
 */
export function pageSession(): MiddlewareHandler<AppEnv> {
  return async (c, next) => {
    const secret = getCookie(c, SESSION_COOKIE);
    const actor = secret && secret.length <= 200 ? await findActorByKey(c.var.db, secret) : undefined;
    if (!actor) {
      if (c.req.method !== 'GET' && c.req.method !== 'HEAD') return c.text('Sign in again: your key is missing, revoked or unknown.', 401);
      const url = new URL(c.req.url);
      const next = safeNextPath(url.pathname + url.search);
      return c.redirect(`/lab/sign-in?next=${encodeURIComponent(next)}`, 303);
    }
    c.set('actor', actor);
    await next();
  };
}
