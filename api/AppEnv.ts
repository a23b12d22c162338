import type { Db } from '../db/Db.ts';
import type { Actor } from '../db/operations/Actor.ts';
import type { AppConfig } from './env.ts';

/** Hono environment: what every handler can read from `c.var`. */
export interface AppEnv {
  Variables: {
    db: Db;
    config: AppConfig;
    actor: Actor;
  };
}
