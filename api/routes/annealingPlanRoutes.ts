import { OpenAPIHono, z } from '@hono/zod-openapi';
import { planToSegmentTable } from '../../src/annealing/planToSegmentTable.ts';
import { ExportFormatQuery, RecommendationQuery } from '../../db/inputs/annealing.ts';
import { annealingRecommendation } from '../../db/operations/annealing/annealingRecommendation.ts';
import { generateModelPlan } from '../../db/operations/annealing/generateModelPlan.ts';
import { getPlan } from '../../db/operations/annealing/getPlan.ts';
import { listModelPlans } from '../../db/operations/annealing/listModelPlans.ts';
import type { AppEnv } from '../AppEnv.ts';
import { PlanInputSchema, PlanSchema, RecommendationSchema } from '../schemas/annealingSchemas.ts';
import { IdParam } from '../schemas/idParam.ts';
import { toJson } from '../schemas/toJson.ts';
import { cautionsHeader } from './cautionsHeader.ts';
import { jsonBody, jsonResponse } from './routeParts.ts';
import { secureRoute } from './secureRoute.ts';

const tags = ['Annealing plans'];

export function annealingPlanRoutes(app: OpenAPIHono<AppEnv>): void {
  app.openapi(
    secureRoute('technician', { method: 'post', path: '/v1/models/{id}/annealing-plans', tags, summary: "Generate and store an annealing plan for a model (its material's house cycle or published default, its thickness)", request: { params: IdParam, body: jsonBody(PlanInputSchema) }, responses: { 201: jsonResponse(PlanSchema, 'The stored plan, with cautions') } }),
    async (c) => c.json(toJson(await generateModelPlan(c.var.db, c.var.actor, c.req.valid('param').id, c.req.valid('json'))) as never, 201),
  );
  app.openapi(
    secureRoute('viewer', { method: 'get', path: '/v1/models/{id}/annealing-plans', tags, summary: 'Plans made for a model, oldest first', request: { params: IdParam }, responses: { 200: jsonResponse(z.array(PlanSchema), 'The plans') } }),
    async (c) => c.json(toJson(await listModelPlans(c.var.db, c.var.actor, c.req.valid('param').id)) as never, 200),
  );
  app.openapi(
    secureRoute('viewer', {
      method: 'get',
      path: '/v1/annealing/plans/{id}',
      tags,
      summary: 'A stored plan as JSON, or (format=csv) the segment table to key into an oven controller',
      description: 'The CSV has the columns segment, kind, target_c, rate_c_per_h (blank for a soak) and duration_h_mm; the cautions travel in the X-Annealing-Cautions header, separated by " | ".',
      request: { params: IdParam, query: ExportFormatQuery },
      responses: { 200: { description: 'The plan', content: { 'application/json': { schema: PlanSchema }, 'text/csv': { schema: { type: 'string' as const } } } } },
    }),
    async (c) => {
      const plan = await getPlan(c.var.db, c.var.actor, c.req.valid('param').id);
      if (c.req.valid('query').format === 'json') return c.json(toJson(plan) as never, 200);
      return c.body(planToSegmentTable(plan.plan), 200, {
        'content-type': 'text/csv; charset=utf-8',
        'content-disposition': `attachment; filename="annealing-plan-${plan.id}.csv"`,
        'x-annealing-cautions': cautionsHeader(plan.cautions),
      });
    },
  );
  app.openapi(
    secureRoute('viewer', { method: 'get', path: '/v1/models/{id}/annealing-recommendation', tags, summary: 'Does the model need annealing, which cycle to run, the plan, and what that cycle achieved here before', request: { params: IdParam, query: RecommendationQuery }, responses: { 200: jsonResponse(RecommendationSchema, 'The recommendation') } }),
    async (c) => c.json(toJson(await annealingRecommendation(c.var.db, c.var.actor, c.req.valid('param').id, c.req.valid('query'))) as never, 200),
  );
}
