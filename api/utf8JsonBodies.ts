import type { MiddlewareHandler } from 'hono';
import type { AppEnv } from './AppEnv.ts';
import { problemResponse } from './problem/problemResponse.ts';

const JSON_TYPE = /^application\/(?:[\w.+-]+\+)?json$/;

/** PostgreSQL cannot store U+0000 in text or jsonb; it is refused here rather than cut or failed on. */
function holdsNul(text: string): boolean {
  let found = false;
  try {
    JSON.parse(text, (key, value: unknown) => {
      if ((typeof value === 'string' && value.includes('\u0000')) || key.includes('\u0000')) found = true;
      return value;
    });
  } catch {
    return false;
  }
  return found;
}

/**
 * Refuses JSON bodies that declare a charset other than UTF-8 (415), hold invalid UTF-8 (400) or
 * carry U+0000 in a string (422).
 * The framework's own reader would turn bad bytes into U+FFFD and store them in names and notes.
 * The body is read through c.req so the validator after it reuses the cached bytes. Import
 * routes check their files themselves, with the row of the bad byte.
 */
export function utf8JsonBodies(skipPath: RegExp): MiddlewareHandler<AppEnv> {
  return async (c, next) => {
    if (c.req.method === 'GET' || c.req.method === 'HEAD' || skipPath.test(c.req.path)) return next();
    const [type = '', ...params] = (c.req.header('content-type') ?? '').toLowerCase().split(';').map((p) => p.trim());
    if (!JSON_TYPE.test(type)) return next();
    const charset = params.find((p) => p.startsWith('charset='))?.slice(8).replace(/"/g, '');
    if (charset && charset !== 'utf-8' && charset !== 'utf8') {
      return problemResponse(415, 'unsupported_media_type', `Send JSON in UTF-8, not charset "${charset}".`);
    }
    let text: string;
    try {
      text = new TextDecoder('utf-8', { fatal: true }).decode(await c.req.arrayBuffer());
    } catch {
      return problemResponse(400, 'malformed_request', 'The JSON body is not valid UTF-8.');
    }
    if (text.includes('\\u0000') && holdsNul(text)) {
      return problemResponse(422, 'invalid_input', 'Text in the body contains the character U+0000, which cannot be stored.');
    }
    await next();
  };
}
