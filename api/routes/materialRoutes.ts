import { OpenAPIHono, z } from '@hono/zod-openapi';
import { createBatch } from '../../db/operations/materials/createBatch.ts';
import { createMaterial } from '../../db/operations/materials/createMaterial.ts';
import { getBatch } from '../../db/operations/materials/getBatch.ts';
import { getMaterial } from '../../db/operations/materials/getMaterial.ts';
import { listBatches } from '../../db/operations/materials/listBatches.ts';
import { listMaterials } from '../../db/operations/materials/listMaterials.ts';
import type { AppEnv } from '../AppEnv.ts';
import { IdParam, ListQuerySchema } from '../schemas/idParam.ts';
import { BatchInputSchema, MaterialInputSchema } from '../schemas/inputSchemas.ts';
import { BatchRow, MaterialRow, pageOf } from '../schemas/rowSchemas.ts';
import { toJson } from '../schemas/toJson.ts';
import { jsonBody, jsonResponse } from './routeParts.ts';
import { secureRoute } from './secureRoute.ts';

const tags = ['Materials and batches'];

export function materialRoutes(app: OpenAPIHono<AppEnv>): void {
  app.openapi(
    secureRoute('viewer', { method: 'get', path: '/v1/materials', tags, summary: 'List materials', request: { query: ListQuerySchema }, responses: { 200: jsonResponse(pageOf(MaterialRow, 'MaterialPage'), 'A page of materials') } }),
    async (c) => c.json(toJson(await listMaterials(c.var.db, c.var.actor, c.req.valid('query'))), 200),
  );
  app.openapi(
    secureRoute('admin', { method: 'post', path: '/v1/materials', tags, summary: 'Add a material with its properties and their sources', request: { body: jsonBody(MaterialInputSchema) }, responses: { 201: jsonResponse(MaterialRow, 'The stored material') } }),
    async (c) => c.json(toJson(await createMaterial(c.var.db, c.var.actor, c.req.valid('json'))), 201),
  );
  app.openapi(
    secureRoute('viewer', { method: 'get', path: '/v1/materials/{id}', tags, summary: 'One material', request: { params: IdParam }, responses: { 200: jsonResponse(MaterialRow, 'The material') } }),
    async (c) => c.json(toJson(await getMaterial(c.var.db, c.var.actor, c.req.valid('param').id)), 200),
  );
  app.openapi(
    secureRoute('viewer', {
      method: 'get',
      path: '/v1/batches',
      tags,
      summary: 'List batches and sheet lots',
      request: { query: ListQuerySchema.extend({ materialId: z.uuid().optional() }) },
      responses: { 200: jsonResponse(pageOf(BatchRow, 'BatchPage'), 'A page of batches') },
    }),
    async (c) => c.json(toJson(await listBatches(c.var.db, c.var.actor, c.req.valid('query'))), 200),
  );
  app.openapi(
    secureRoute('technician', { method: 'post', path: '/v1/batches', tags, summary: 'Record a cast batch or sheet lot', request: { body: jsonBody(BatchInputSchema) }, responses: { 201: jsonResponse(BatchRow, 'The stored batch') } }),
    async (c) => c.json(toJson(await createBatch(c.var.db, c.var.actor, c.req.valid('json'))), 201),
  );
  app.openapi(
    secureRoute('viewer', { method: 'get', path: '/v1/batches/{id}', tags, summary: 'One batch', request: { params: IdParam }, responses: { 200: jsonResponse(BatchRow, 'The batch') } }),
    async (c) => c.json(toJson(await getBatch(c.var.db, c.var.actor, c.req.valid('param').id)), 200),
  );
}
