import type { MiddlewareHandler } from 'hono';
import { bodyLimit } from 'hono/body-limit';
import { csrf } from 'hono/csrf';
import type { AppEnv } from '../../AppEnv.ts';

// Nothing inline, nothing from elsewhere: the pages work without script, and styles come from
// one stylesheet, so any injected markup stays inert.
export const PAGE_CONTENT_SECURITY_POLICY = [
  "default-src 'self'",
  "script-src 'self'",
  "style-src 'self'",
  "img-src 'self'",
  "object-src 'none'",
  "base-uri 'none'",
  "form-action 'self'",
  "frame-ancestors 'none'",
].join('; ');

const FORM_TYPES = /^(application\/x-www-form-urlencoded|multipart\/form-data)\b/i;
const originCheck = csrf();
// A bench form is a few hundred bytes; anything near this is not a form the pages made.
const formLimit = bodyLimit({ maxSize: 64 * 1024, onError: (c) => c.text('The form is larger than the pages accept.', 413) });

/**
 * The pages' own guard: a strict Content-Security-Policy and no caching of pages that show
 * lab records, and for writes an origin check (hono/csrf) on form bodies only; any other body
 * type is refused, since the csrf middleware does not look at JSON and the pages never take it.
 */
export function pageSecurity(): MiddlewareHandler<AppEnv> {
  return async (c, next) => {
    if (c.req.method === 'POST') {
      if (!FORM_TYPES.test(c.req.header('content-type') ?? '')) return c.text('The lab pages accept form posts only.', 415);
      await originCheck(c, async () => {});
      // bodyLimit hands back its own 413 as a Response; after a passed check it returns next()'s value.
      const refused: unknown = await formLimit(c, next);
      if (refused instanceof Response) return refused;
    } else {
      await next();
    }
    c.header('Content-Security-Policy', PAGE_CONTENT_SECURITY_POLICY);
    if (!c.req.path.startsWith('/lab/assets/')) c.header('Cache-Control', 'no-store');
  };
}
