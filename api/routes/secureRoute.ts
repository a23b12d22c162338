import { createRoute, type RouteConfig } from '@hono/zod-openapi';
import type { Role } from '../../db/operations/Actor.ts';
import { requireRole } from '../auth/requireRole.ts';
import { problemResponses } from '../schemas/problemSchema.ts';

/**
 * A route that needs a key of at least `minRole`. The role is written into the OpenAPI
 * operation as `x-min-role`, which is also the route table the access tests walk.
 */
export function secureRoute<const R extends RouteConfig>(minRole: Role, config: R): R {
  return createRoute({
    ...config,
    security: [{ apiKey: [] }],
    middleware: [requireRole(minRole)],
    'x-min-role': minRole,
    responses: { ...problemResponses, ...config.responses },
  }) as R;
}
