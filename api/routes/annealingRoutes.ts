import type { OpenAPIHono } from '@hono/zod-openapi';
import type { AppEnv } from '../AppEnv.ts';
import { annealingGuidanceRoutes } from './annealingGuidanceRoutes.ts';
import { annealingPlanRoutes } from './annealingPlanRoutes.ts';
import { annealingRunRoutes } from './annealingRunRoutes.ts';

/** Annealing guidance, plans, oven runs with their logs, effectiveness and recommendations. */
export function annealingRoutes(app: OpenAPIHono<AppEnv>): void {
  annealingGuidanceRoutes(app);
  annealingPlanRoutes(app);
  annealingRunRoutes(app);
}
