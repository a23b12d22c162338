import type { MiddlewareHandler } from 'hono';
import type { AppEnv } from './AppEnv.ts';

class RollBack extends Error {}

/**
 * Runs every write request in one transaction that commits only when the answer is a
 * success, so a request that fails half-way leaves nothing behind. Inside an outer
 * transaction (tests, bulk work) it becomes a savepoint.
 */
export function transactionalWrites(): MiddlewareHandler<AppEnv> {
  return async (c, next) => {
    if (c.req.method === 'GET' || c.req.method === 'HEAD' || c.req.method === 'OPTIONS') return next();
    try {
      await c.var.db.transaction(async (tx) => {
        c.set('db', tx);
        await next();
        if (c.error || c.res.status >= 400) throw new RollBack();
      });
    } catch (error) {
      if (!(error instanceof RollBack)) throw error;
    }
  };
}
