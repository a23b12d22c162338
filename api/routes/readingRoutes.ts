import { OpenAPIHono, z } from '@hono/zod-openapi';
import { ReadingListQuery } from '../../db/inputs/readings.ts';
import { amendReading } from '../../db/operations/readings/amendReading.ts';
import { getReading } from '../../db/operations/readings/getReading.ts';
import { listSiteReadings } from '../../db/operations/readings/listSiteReadings.ts';
import { recordReading } from '../../db/operations/readings/recordReading.ts';
import type { AppEnv } from '../AppEnv.ts';
import { IdParam } from '../schemas/idParam.ts';
import { AmendmentInputSchema, ReadingInputSchema } from '../schemas/inputSchemas.ts';
import { pageOf, ReadingRow } from '../schemas/rowSchemas.ts';
import { toJson } from '../schemas/toJson.ts';
import { DomainError } from '../../src/errors/DomainError.ts';
import { problemResponseSpec } from '../schemas/problemSchema.ts';
import { ifMatchAccepts } from './ifMatchAccepts.ts';
import { readingEtag } from './readingEtag.ts';
import { jsonBody, jsonResponse } from './routeParts.ts';
import { secureRoute } from './secureRoute.ts';

const tags = ['Fringe readings'];

const IfMatchHeader = z.object({
  'if-match': z.string().max(400).optional().openapi({ description: 'The ETag of GET /v1/readings/{id}; a stale one answers 412 so two people never both amend the same reading' }),
});

const ReadingWithSuccessor = ReadingRow.extend({ supersededById: z.uuid().nullable() }).openapi('ReadingWithSuccessor');

export function readingRoutes(app: OpenAPIHono<AppEnv>): void {
  app.openapi(
    secureRoute('viewer', { method: 'get', path: '/v1/sites/{id}/readings', tags, summary: 'Readings at a site, in observation order (current ones unless includeSuperseded=true)', request: { params: IdParam, query: ReadingListQuery }, responses: { 200: jsonResponse(pageOf(ReadingRow, 'ReadingPage'), 'A page of readings') } }),
    async (c) => c.json(toJson(await listSiteReadings(c.var.db, c.var.actor, c.req.valid('param').id, c.req.valid('query'))), 200),
  );
  app.openapi(
    secureRoute('technician', { method: 'post', path: '/v1/sites/{id}/readings', tags, summary: 'Record a fringe reading with its raw inputs; the fringe order is derived', request: { params: IdParam, body: jsonBody(ReadingInputSchema) }, responses: { 201: jsonResponse(ReadingRow, 'The stored reading') } }),
    async (c) => c.json(toJson(await recordReading(c.var.db, c.var.actor, c.req.valid('param').id, c.req.valid('json'))), 201),
  );
  app.openapi(
    secureRoute('viewer', { method: 'get', path: '/v1/readings/{id}', tags, summary: 'One reading, with the id of the amendment that superseded it (ETag for If-Match on amendments)', request: { params: IdParam }, responses: { 200: { ...jsonResponse(ReadingWithSuccessor, 'The reading'), headers: { ETag: { description: 'Changes when the reading is superseded', schema: { type: 'string' } } } } } }),
    async (c) => {
      const reading = await getReading(c.var.db, c.var.actor, c.req.valid('param').id);
      return c.json(toJson(reading), 200, { etag: readingEtag(reading) });
    },
  );
  app.openapi(
    secureRoute('technician', { method: 'post', path: '/v1/readings/{id}/amendments', tags, summary: 'Supersede a reading with a corrected one (who, when and why are kept)', request: { params: IdParam, headers: IfMatchHeader, body: jsonBody(AmendmentInputSchema) }, responses: { 201: jsonResponse(ReadingRow, 'The amending reading'), 409: problemResponseSpec('The reading was already amended (also the loser of two simultaneous amendments)'), 412: problemResponseSpec('If-Match names a state of the reading that is no longer current') } }),
    async (c) => {
      const { id } = c.req.valid('param');
      const ifMatch = c.req.valid('header')['if-match'];
      if (ifMatch !== undefined) {
        const etag = readingEtag(await getReading(c.var.db, c.var.actor, id));
        if (!ifMatchAccepts(ifMatch, etag)) throw new DomainError('precondition_failed', `Reading ${id} changed since it was read (now ${etag}); read it again before amending.`, [{ field: 'header.if-match', message: `does not match ${etag}` }]);
      }
      return c.json(toJson(await amendReading(c.var.db, c.var.actor, id, c.req.valid('json'))), 201);
    },
  );
}
