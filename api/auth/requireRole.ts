import type { MiddlewareHandler } from 'hono';
import { roleAtLeast, type Role } from '../../db/operations/Actor.ts';
import type { AppEnv } from '../AppEnv.ts';
import { problemResponse } from '../problem/problemResponse.ts';

export function requireRole(needed: Role): MiddlewareHandler<AppEnv> {
  return async (c, next) => {
    if (!roleAtLeast(c.var.actor.role, needed)) {
      return problemResponse(403, 'forbidden', `This action needs the ${needed} role; the key has ${c.var.actor.role}.`);
    }
    await next();
  };
}
