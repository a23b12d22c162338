import { OpenAPIHono } from '@hono/zod-openapi';
import { HTTPException } from 'hono/http-exception';
import { EffectivenessHistoryQuery, EffectivenessQuery, ExportFormatQuery, OvenLogImportQuery, RunListQuery } from '../../db/inputs/annealing.ts';
import { amendRun } from '../../db/operations/annealing/amendRun.ts';
import { effectivenessHistory } from '../../db/operations/annealing/effectivenessHistory.ts';
import { getOvenLog } from '../../db/operations/annealing/getOvenLog.ts';
import { getRun } from '../../db/operations/annealing/getRun.ts';
import { importOvenLog } from '../../db/operations/annealing/importOvenLog.ts';
import { listRuns } from '../../db/operations/annealing/listRuns.ts';
import { ovenLogSamplesCsv } from '../../db/operations/annealing/ovenLogSamplesCsv.ts';
import { recordRun } from '../../db/operations/annealing/recordRun.ts';
import { runEffectiveness } from '../../db/operations/annealing/runEffectiveness.ts';
import type { AppEnv } from '../AppEnv.ts';
import { EffectivenessHistorySchema, OvenLogSchema, RunAmendmentInputSchema, RunEffectivenessSchema, RunInputSchema, RunListItemSchema, RunSchema } from '../schemas/annealingSchemas.ts';
import { IdParam } from '../schemas/idParam.ts';
import { problemResponseSpec } from '../schemas/problemSchema.ts';
import { pageOf } from '../schemas/rowSchemas.ts';
import { toJson } from '../schemas/toJson.ts';
import { jsonBody, jsonResponse } from './routeParts.ts';
import { secureRoute } from './secureRoute.ts';

const tags = ['Annealing runs and oven logs'];

export function annealingRunRoutes(app: OpenAPIHono<AppEnv>): void {
  app.openapi(
    secureRoute('technician', { method: 'post', path: '/v1/annealing/runs', tags, summary: 'Record an oven run: plan, oven, the models in the load, who, when', request: { body: jsonBody(RunInputSchema) }, responses: { 201: jsonResponse(RunSchema, 'The stored run, with warnings about the load') } }),
    async (c) => c.json(toJson(await recordRun(c.var.db, c.var.actor, c.req.valid('json'))) as never, 201),
  );
  app.openapi(
    secureRoute('viewer', { method: 'get', path: '/v1/annealing/runs', tags, summary: 'Runs by start time (optionally those holding one model)', request: { query: RunListQuery }, responses: { 200: jsonResponse(pageOf(RunListItemSchema, 'AnnealingRunPage'), 'A page of runs') } }),
    async (c) => c.json(toJson(await listRuns(c.var.db, c.var.actor, c.req.valid('query'))), 200),
  );
  app.openapi(
    secureRoute('viewer', { method: 'get', path: '/v1/annealing/runs/{id}', tags, summary: 'A run with its load, plan and current oven log verdict', request: { params: IdParam }, responses: { 200: jsonResponse(RunSchema, 'The run') } }),
    async (c) => c.json(toJson(await getRun(c.var.db, c.var.actor, c.req.valid('param').id)) as never, 200),
  );
  app.openapi(
    secureRoute('technician', { method: 'post', path: '/v1/annealing/runs/{id}/amendments', tags, summary: 'Supersede a run record with a corrected one (who, when and why are kept)', request: { params: IdParam, body: jsonBody(RunAmendmentInputSchema) }, responses: { 201: jsonResponse(RunSchema, 'The amending run'), 409: problemResponseSpec('The run was already amended') } }),
    async (c) => c.json(toJson(await amendRun(c.var.db, c.var.actor, c.req.valid('param').id, c.req.valid('json'))) as never, 201),
  );
  app.openapi(
    secureRoute('technician', {
      method: 'post',
      path: '/v1/annealing/runs/{id}/oven-logs/import',
      tags,
      summary: "Import the oven's log (CSV) and compare it with the plan: pass, pass with remarks, or fail with the reasons",
      description: 'Columns: one of elapsed_h, elapsed_min or timestamp (ISO 8601 with offset), and temperature_c; others are ignored. All rows or none: bad cells come back as 422 with row and field. A second log for a run names the one it supersedes (supersedesLogId) and why (reason). rateWindowH, deviationC, overshootC and soakBandC widen the comparison for a noisy logger; the tolerances used are stored with the comparison.',
      request: { params: IdParam, query: OvenLogImportQuery, body: { required: true, content: { 'text/csv': { schema: { type: 'string' as const, example: 'elapsed_h,temperature_c\n0,23.0\n0.1,25.1\n' } } } } },
      responses: { 201: jsonResponse(OvenLogSchema, 'The stored log and its comparison'), 409: problemResponseSpec('The run already has a current log, or the named log was superseded'), 415: problemResponseSpec('Not text/csv') },
    }),
    async (c) => {
      const type = (c.req.header('content-type') ?? '').toLowerCase();
      if (!type.startsWith('text/csv')) throw new HTTPException(415, { message: `Send the oven log as text/csv, not "${type || 'no content type'}".` });
      const body = new Uint8Array(await c.req.arrayBuffer());
      const { supersedesLogId, reason, ...given } = c.req.valid('query');
      const tolerances = Object.fromEntries(Object.entries(given).filter(([, v]) => v !== undefined));
      return c.json(toJson(await importOvenLog(c.var.db, c.var.actor, c.req.valid('param').id, { body, supersedesLogId, reason, tolerances })) as never, 201);
    },
  );
  app.openapi(
    secureRoute('viewer', { method: 'get', path: '/v1/annealing/oven-logs/{id}', tags, summary: 'An oven log with its comparison, or (format=csv) its samples in the import columns', request: { params: IdParam, query: ExportFormatQuery }, responses: { 200: { description: 'The log', content: { 'application/json': { schema: OvenLogSchema }, 'text/csv': { schema: { type: 'string' as const } } } } } }),
    async (c) => {
      const id = c.req.valid('param').id;
      if (c.req.valid('query').format === 'json') return c.json(toJson(await getOvenLog(c.var.db, c.var.actor, id)) as never, 200);
      return c.body(await ovenLogSamplesCsv(c.var.db, c.var.actor, id), 200, { 'content-type': 'text/csv; charset=utf-8', 'content-disposition': `attachment; filename="oven-log-${id}.csv"` });
    },
  );
  app.openapi(
    secureRoute('viewer', { method: 'get', path: '/v1/annealing/runs/{id}/effectiveness', tags, summary: 'Anneal relief per site and whether each model came out within its limit', request: { params: IdParam, query: EffectivenessQuery }, responses: { 200: jsonResponse(RunEffectivenessSchema, 'Relief per site and model') } }),
    async (c) => c.json(toJson(await runEffectiveness(c.var.db, c.var.actor, c.req.valid('param').id, c.req.valid('query').windowH)) as never, 200),
  );
  app.openapi(
    secureRoute('viewer', { method: 'get', path: '/v1/annealing/effectiveness', tags, summary: "What each cycle achieved per material over the lab's history", request: { query: EffectivenessHistoryQuery }, responses: { 200: jsonResponse(EffectivenessHistorySchema, 'One row per material and guidance entry') } }),
    async (c) => c.json(toJson(await effectivenessHistory(c.var.db, c.var.actor, c.req.valid('query'))), 200),
  );
}
