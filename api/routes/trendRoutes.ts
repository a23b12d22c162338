import type { OpenAPIHono } from '@hono/zod-openapi';
import { compareTrendGroups } from '../../db/operations/trends/compareTrendGroups.ts';
import { readControlChart } from '../../db/operations/trends/readControlChart.ts';
import { readEdgeAging } from '../../db/operations/trends/readEdgeAging.ts';
import { residualSummaryCsv } from '../../db/operations/trends/residualSummaryCsv.ts';
import { summariseResiduals } from '../../db/operations/trends/summariseResiduals.ts';
import type { AppEnv } from '../AppEnv.ts';
import {
  CompareQuerySchema,
  CompareSchema,
  ControlChartQuerySchema,
  ControlChartSchema,
  EdgeAgingQuerySchema,
  EdgeAgingSchema,
  ResidualTrendQuerySchema,
  ResidualTrendSchema,
} from '../schemas/trendSchemas.ts';
import { toJson } from '../schemas/toJson.ts';
import { jsonResponse } from './routeParts.ts';
import { secureRoute } from './secureRoute.ts';

const tags = ['Trends'];

export function trendRoutes(app: OpenAPIHono<AppEnv>): void {
  app.openapi(
    secureRoute('viewer', {
      method: 'get',
      path: '/v1/trends/residuals',
      tags,
      summary: 'Residual fringe order and stress at one stage, grouped by batch, material, geometry, machining method, operator, site kind, week or month',
      description: 'Current readings only, aggregated in one SQL statement. Every answer gives the readings and models it used. `format=csv` gives the same figures as CSV, one row per group and a last row for all readings.',
      request: { query: ResidualTrendQuerySchema },
      responses: {
        200: {
          description: 'Statistics per group and for all readings together',
          content: { 'application/json': { schema: ResidualTrendSchema }, 'text/csv': { schema: { type: 'string' as const } } },
        },
      },
    }),
    async (c) => {
      const query = c.req.valid('query');
      const summary = await summariseResiduals(c.var.db, c.var.actor, query);
      if (query.format === 'csv') {
        return c.body(residualSummaryCsv(summary), 200, {
          'content-type': 'text/csv; charset=utf-8',
          'content-disposition': `attachment; filename="residuals-by-${query.groupBy}-${query.stage}.csv"`,
        });
      }
      return c.json(toJson(summary), 200);
    },
  );
  app.openapi(
    secureRoute('viewer', { method: 'get', path: '/v1/trends/control-chart', tags, summary: 'Individuals and moving-range chart with run rules: a model\'s readings, or one point per model of a batch', request: { query: ControlChartQuerySchema }, responses: { 200: jsonResponse(ControlChartSchema, 'The chart, or why it cannot be drawn') } }),
    async (c) => c.json(toJson(await readControlChart(c.var.db, c.var.actor, c.req.valid('query'))), 200),
  );
  app.openapi(
    secureRoute('viewer', { method: 'get', path: '/v1/trends/compare', tags, summary: 'Compare two groups (two batches, two machining methods…): Welch interval and Mann–Whitney U', request: { query: CompareQuerySchema }, responses: { 200: jsonResponse(CompareSchema, 'The comparison, or why the groups are too small') } }),
    async (c) => c.json(toJson(await compareTrendGroups(c.var.db, c.var.actor, c.req.valid('query'))), 200),
  );
  app.openapi(
    secureRoute('viewer', { method: 'get', path: '/v1/trends/edge-aging', tags, summary: 'Edge residual against storage time since machining, √t or linear fit, and a test-before date per stored model', request: { query: EdgeAgingQuerySchema }, responses: { 200: jsonResponse(EdgeAgingSchema, 'The fit and the stored models\' forecasts') } }),
    async (c) => c.json(toJson(await readEdgeAging(c.var.db, c.var.actor, c.req.valid('query'))), 200),
  );
}
