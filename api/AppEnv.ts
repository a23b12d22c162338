import type { Db } from '../db/Db.ts';
import type { Actor } from '../db/operations/Actor.ts';
import type { FailedKeyLimiter } from './auth/failedKeyLimiter.ts';
import type { AppConfig } from './env.ts';

/** Hono environment: what every handler can read from `c.var`. */
export interface AppEnv {
  Variables: {
    db: Db;
    config: AppConfig;
    actor: Actor;
    /** One limit on wrong keys per address, shared by the API and the pages' sign-in. */
    keyLimiter: FailedKeyLimiter;
  };
}
