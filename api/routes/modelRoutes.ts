import { OpenAPIHono, z } from '@hono/zod-openapi';
import { createModel } from '../../db/operations/models/createModel.ts';
import { createSite } from '../../db/operations/models/createSite.ts';
import { getModelDetail } from '../../db/operations/models/getModelDetail.ts';
import { getSite } from '../../db/operations/models/getSite.ts';
import { listModelEvents } from '../../db/operations/models/listModelEvents.ts';
import { listModels } from '../../db/operations/models/listModels.ts';
import { listSites } from '../../db/operations/models/listSites.ts';
import { recordModelEvent } from '../../db/operations/models/recordModelEvent.ts';
import type { AppEnv } from '../AppEnv.ts';
import { IdParam, ListQuerySchema } from '../schemas/idParam.ts';
import { EventInputSchema, ModelInputSchema, SiteInputSchema } from '../schemas/inputSchemas.ts';
import { ModelDetailSchema } from '../schemas/modelDetailSchema.ts';
import { ModelEventRow, ModelRow, pageOf, SiteRow } from '../schemas/rowSchemas.ts';
import { toJson } from '../schemas/toJson.ts';
import { jsonBody, jsonResponse } from './routeParts.ts';
import { secureRoute } from './secureRoute.ts';

const tags = ['Models, sites and history'];

export function modelRoutes(app: OpenAPIHono<AppEnv>): void {
  app.openapi(
    secureRoute('viewer', { method: 'get', path: '/v1/models', tags, summary: 'List models', request: { query: ListQuerySchema.extend({ batchId: z.uuid().optional() }) }, responses: { 200: jsonResponse(pageOf(ModelRow, 'ModelPage'), 'A page of models') } }),
    async (c) => c.json(toJson(await listModels(c.var.db, c.var.actor, c.req.valid('query'))), 200),
  );
  app.openapi(
    secureRoute('technician', { method: 'post', path: '/v1/models', tags, summary: 'Record a model (specimen) with its geometry and thickness', request: { body: jsonBody(ModelInputSchema) }, responses: { 201: jsonResponse(ModelRow, 'The stored model') } }),
    async (c) => c.json(toJson(await createModel(c.var.db, c.var.actor, c.req.valid('json'))), 201),
  );
  app.openapi(
    secureRoute('viewer', { method: 'get', path: '/v1/models/{id}', tags, summary: 'A model with its batch, material, sites, timeline and time since machining', request: { params: IdParam }, responses: { 200: jsonResponse(ModelDetailSchema, 'The model in full') } }),
    async (c) => c.json(toJson(await getModelDetail(c.var.db, c.var.actor, c.req.valid('param').id)), 200),
  );
  app.openapi(
    secureRoute('viewer', { method: 'get', path: '/v1/models/{id}/sites', tags, summary: 'Measurement sites of a model', request: { params: IdParam }, responses: { 200: jsonResponse(z.array(SiteRow), 'The sites') } }),
    async (c) => c.json(toJson(await listSites(c.var.db, c.var.actor, c.req.valid('param').id)), 200),
  );
  app.openapi(
    secureRoute('technician', { method: 'post', path: '/v1/models/{id}/sites', tags, summary: 'Add a measurement site (e.g. a notch root)', request: { params: IdParam, body: jsonBody(SiteInputSchema) }, responses: { 201: jsonResponse(SiteRow, 'The stored site') } }),
    async (c) => c.json(toJson(await createSite(c.var.db, c.var.actor, c.req.valid('param').id, c.req.valid('json'))), 201),
  );
  app.openapi(
    secureRoute('viewer', { method: 'get', path: '/v1/sites/{id}', tags, summary: 'One measurement site', request: { params: IdParam }, responses: { 200: jsonResponse(SiteRow, 'The site') } }),
    async (c) => c.json(toJson(await getSite(c.var.db, c.var.actor, c.req.valid('param').id)), 200),
  );
  app.openapi(
    secureRoute('viewer', { method: 'get', path: '/v1/models/{id}/events', tags, summary: 'The fabrication history, oldest first', request: { params: IdParam, query: ListQuerySchema }, responses: { 200: jsonResponse(pageOf(ModelEventRow, 'ModelEventPage'), 'A page of events') } }),
    async (c) => c.json(toJson(await listModelEvents(c.var.db, c.var.actor, c.req.valid('param').id, c.req.valid('query'))), 200),
  );
  app.openapi(
    secureRoute('technician', { method: 'post', path: '/v1/models/{id}/events', tags, summary: 'Record a fabrication event (cast, cured, machined, polished, annealed, loaded, stored…)', request: { params: IdParam, body: jsonBody(EventInputSchema) }, responses: { 201: jsonResponse(ModelEventRow, 'The stored event') } }),
    async (c) => c.json(toJson(await recordModelEvent(c.var.db, c.var.actor, c.req.valid('param').id, c.req.valid('json'))), 201),
  );
}
