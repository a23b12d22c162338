import { OpenAPIHono, z } from '@hono/zod-openapi';
import { GuidanceListQuery, HouseCycleQuery } from '../../db/inputs/annealing.ts';
import { amendGuidanceEntry } from '../../db/operations/annealing/amendGuidanceEntry.ts';
import { createGuidanceEntry } from '../../db/operations/annealing/createGuidanceEntry.ts';
import { getGuidanceEntry } from '../../db/operations/annealing/getGuidanceEntry.ts';
import { listGuidanceEntries } from '../../db/operations/annealing/listGuidanceEntries.ts';
import { listHouseCycles } from '../../db/operations/annealing/listHouseCycles.ts';
import { setHouseCycle } from '../../db/operations/annealing/setHouseCycle.ts';
import type { AppEnv } from '../AppEnv.ts';
import { GuidanceAmendmentInputSchema, GuidanceEntryInputSchema, GuidanceEntrySchema, HouseCycleInputSchema, HouseCycleSchema } from '../schemas/annealingSchemas.ts';
import { IdParam } from '../schemas/idParam.ts';
import { problemResponseSpec } from '../schemas/problemSchema.ts';
import { toJson } from '../schemas/toJson.ts';
import { jsonBody, jsonResponse } from './routeParts.ts';
import { secureRoute } from './secureRoute.ts';

const tags = ['Annealing guidance'];

export function annealingGuidanceRoutes(app: OpenAPIHono<AppEnv>): void {
  app.openapi(
    secureRoute('viewer', { method: 'get', path: '/v1/annealing/guidance', tags, summary: "Published annealing guidance (current catalogue version) and the lab's own entries", request: { query: GuidanceListQuery }, responses: { 200: jsonResponse(z.array(GuidanceEntrySchema), 'The entries') } }),
    async (c) => c.json(toJson(await listGuidanceEntries(c.var.db, c.var.actor, c.req.valid('query'))), 200),
  );
  app.openapi(
    secureRoute('viewer', { method: 'get', path: '/v1/annealing/guidance/{id}', tags, summary: 'One guidance entry with its sources', request: { params: IdParam }, responses: { 200: jsonResponse(GuidanceEntrySchema, 'The entry') } }),
    async (c) => c.json(toJson(await getGuidanceEntry(c.var.db, c.var.actor, c.req.valid('param').id)), 200),
  );
  app.openapi(
    secureRoute('admin', { method: 'post', path: '/v1/annealing/guidance', tags, summary: "Add one of the lab's own guidance entries (checked like the published ones)", request: { body: jsonBody(GuidanceEntryInputSchema) }, responses: { 201: jsonResponse(GuidanceEntrySchema, 'The stored entry'), 409: problemResponseSpec('The key is taken by a published entry or another current lab entry') } }),
    async (c) => c.json(toJson(await createGuidanceEntry(c.var.db, c.var.actor, c.req.valid('json'))), 201),
  );
  app.openapi(
    secureRoute('admin', { method: 'post', path: '/v1/annealing/guidance/{id}/amendments', tags, summary: "Supersede one of the lab's entries with a corrected version (published entries are read-only: 403)", request: { params: IdParam, body: jsonBody(GuidanceAmendmentInputSchema) }, responses: { 201: jsonResponse(GuidanceEntrySchema, 'The amending entry'), 409: problemResponseSpec('The entry was already amended') } }),
    async (c) => c.json(toJson(await amendGuidanceEntry(c.var.db, c.var.actor, c.req.valid('param').id, c.req.valid('json'))), 201),
  );
  app.openapi(
    secureRoute('viewer', { method: 'get', path: '/v1/annealing/house-cycles', tags, summary: 'House-cycle marks, newest first; the first per family is in force', request: { query: HouseCycleQuery }, responses: { 200: jsonResponse(z.array(HouseCycleSchema), 'The marks') } }),
    async (c) => c.json(toJson(await listHouseCycles(c.var.db, c.var.actor, c.req.valid('query'))), 200),
  );
  app.openapi(
    secureRoute('admin', { method: 'post', path: '/v1/annealing/house-cycles', tags, summary: "Mark an entry as the lab's house cycle for a material family (the newest mark wins)", request: { body: jsonBody(HouseCycleInputSchema) }, responses: { 201: jsonResponse(HouseCycleSchema, 'The mark now in force') } }),
    async (c) => c.json(toJson(await setHouseCycle(c.var.db, c.var.actor, c.req.valid('json'))), 201),
  );
}
