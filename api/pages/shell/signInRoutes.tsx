import type { Hono } from 'hono';
import { deleteCookie, setCookie } from 'hono/cookie';
import { findActorByKey } from '../../../db/operations/keys/findActorByKey.ts';
import { clientAddress } from '../../auth/clientAddress.ts';
import type { AppEnv } from '../../AppEnv.ts';
import { SESSION_COOKIE } from '../../auth/authenticate.ts';
import { Layout } from './Layout.tsx';
import { safeNextPath } from './safeNextPath.ts';

// A working day at the bench; after that the key is asked for again.
const SESSION_SECONDS = 10 * 3600;
const COOKIE_PATH = '/lab';

function SignInPage({ next, problem }: { next: string; problem?: string }) {
  return (
    <Layout title="Sign in" signedIn={false}>
      <h1>Sign in to the lab pages</h1>
      <p class="lede">Paste an API key of your lab. It is kept in a cookie this browser cannot read from script, for this site only.</p>
      {problem && <p class="problem" role="alert">{problem}</p>}
      <form method="post" action="/lab/sign-in" class="entry card">
        <input type="hidden" name="next" value={next} />
        <label class="field">
          API key
          <input type="password" name="key" autocomplete="off" required autofocus maxlength={200} />
        </label>
        <div class="actions">
          <button type="submit" class="primary">Sign in</button>
        </div>
      </form>
    </Layout>
  );
}

/** Sign-in takes a key, checks it and keeps it in the HttpOnly cookie; sign-out clears it. */
export function signInRoutes(app: Hono<AppEnv>): void {
  app.get('/sign-in', (c) => c.html(<SignInPage next={safeNextPath(c.req.query('next'))} />));

  app.post('/sign-in', async (c) => {
    const form = await c.req.parseBody();
    const key = typeof form.key === 'string' ? form.key.trim() : '';
    const next = safeNextPath(typeof form.next === 'string' ? form.next : undefined);
    const address = clientAddress(c);
    const waitS = c.var.keyLimiter.retryAfterS(address);
    if (waitS > 0) {
      c.header('retry-after', String(waitS));
      return c.html(<SignInPage next={next} problem={`Too many wrong keys from this address; try again in ${waitS} s.`} />, 429);
    }
    const actor = key && key.length <= 200 ? await findActorByKey(c.var.db, key) : undefined;
    if (key && !actor) c.var.keyLimiter.recordFailure(address);
    if (!actor) return c.html(<SignInPage next={next} problem="That key is not one of a lab here, or it was revoked." />, 401);
    setCookie(c, SESSION_COOKIE, key, {
      httpOnly: true,
      sameSite: 'Strict',
      secure: new URL(c.req.url).protocol === 'https:',
      path: COOKIE_PATH,
      maxAge: SESSION_SECONDS,
    });
    return c.redirect(next, 303);
  });

  app.post('/sign-out', (c) => {
    deleteCookie(c, SESSION_COOKIE, { path: COOKIE_PATH, secure: new URL(c.req.url).protocol === 'https:' });
    return c.redirect('/lab/sign-in', 303);
  });
}
