import { OpenAPIHono, z } from '@hono/zod-openapi';
import { analyseModelResiduals } from '../../db/operations/analysis/analyseModelResiduals.ts';
import { listAcceptanceCriteria } from '../../db/operations/analysis/listAcceptanceCriteria.ts';
import { listCalibrations } from '../../db/operations/analysis/listCalibrations.ts';
import { recordCalibration } from '../../db/operations/analysis/recordCalibration.ts';
import { setAcceptanceCriteria } from '../../db/operations/analysis/setAcceptanceCriteria.ts';
import type { AppEnv } from '../AppEnv.ts';
import { AcceptanceCriteriaInputSchema, AcceptanceCriteriaRow, CalibrationCreated, CalibrationInputSchema, CalibrationRow, ModelResidualAnalysis } from '../schemas/analysisSchemas.ts';
import { IdParam } from '../schemas/idParam.ts';
import { toJson } from '../schemas/toJson.ts';
import { jsonBody, jsonResponse } from './routeParts.ts';
import { secureRoute } from './secureRoute.ts';

const tags = ['Residual analysis'];

export function analysisRoutes(app: OpenAPIHono<AppEnv>): void {
  app.openapi(
    secureRoute('viewer', {
      method: 'get',
      path: '/v1/models/{id}/residual-analysis',
      tags,
      summary: 'Residual analysis of a model: every site, every stage pair, stresses with uncertainty, Kt and fitness to test',
      request: { params: IdParam },
      responses: { 200: jsonResponse(ModelResidualAnalysis, 'The analysis and the decision') },
    }),
    async (c) => c.json(toJson(await analyseModelResiduals(c.var.db, c.var.actor, c.req.valid('param').id)) as never, 200),
  );
  app.openapi(
    secureRoute('viewer', { method: 'get', path: '/v1/batches/{id}/calibrations', tags, summary: 'Fringe-value calibrations of a batch', request: { params: IdParam }, responses: { 200: jsonResponse(z.array(CalibrationRow), 'The calibrations') } }),
    async (c) => c.json(toJson(await listCalibrations(c.var.db, c.var.actor, c.req.valid('param').id)), 200),
  );
  app.openapi(
    secureRoute('technician', { method: 'post', path: '/v1/batches/{id}/calibrations', tags, summary: 'Record a calibration specimen (disk, tension strip, beam); the fringe value is derived', request: { params: IdParam, body: jsonBody(CalibrationInputSchema) }, responses: { 201: jsonResponse(CalibrationCreated, 'The stored calibration') } }),
    async (c) => c.json(toJson(await recordCalibration(c.var.db, c.var.actor, c.req.valid('param').id, c.req.valid('json'))), 201),
  );
  app.openapi(
    secureRoute('viewer', {
      method: 'get',
      path: '/v1/acceptance-criteria',
      tags,
      summary: 'Limits set for a model or a project, newest (in force) first',
      request: { query: z.object({ modelId: z.uuid().optional(), project: z.string().max(120).optional() }) },
      responses: { 200: jsonResponse(z.array(AcceptanceCriteriaRow), 'The limits') },
    }),
    async (c) => c.json(toJson(await listAcceptanceCriteria(c.var.db, c.var.actor, c.req.valid('query'))), 200),
  );
  app.openapi(
    secureRoute('admin', { method: 'post', path: '/v1/acceptance-criteria', tags, summary: 'Put residual limits in force for a model or a project', request: { body: jsonBody(AcceptanceCriteriaInputSchema) }, responses: { 201: jsonResponse(AcceptanceCriteriaRow, 'The limits now in force') } }),
    async (c) => c.json(toJson(await setAcceptanceCriteria(c.var.db, c.var.actor, c.req.valid('json'))), 201),
  );
}
