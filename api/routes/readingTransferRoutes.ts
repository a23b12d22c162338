import { OpenAPIHono, z } from '@hono/zod-openapi';
import { HTTPException } from 'hono/http-exception';
import { ImportHeaders, ReadingExportQuery } from '../../db/inputs/readingTransfer.ts';
import { exportReadings } from '../../db/operations/readings/exportReadings.ts';
import { importReadings } from '../../db/operations/readings/importReadings.ts';
import { readingExportText } from '../../db/operations/readings/readingExportText.ts';
import type { AppEnv } from '../AppEnv.ts';
import { problemResponseSpec } from '../schemas/problemSchema.ts';
import { ReadingImportRowSchema } from '../schemas/readingImportRowSchema.ts';
import { EXPORT_DESCRIPTION, IMPORT_DESCRIPTION } from './readingTransferDocs.ts';
import { jsonResponse } from './routeParts.ts';
import { secureRoute } from './secureRoute.ts';

const tags = ['Fringe readings'];

const ImportSummarySchema = z
  .object({
    importId: z.uuid(),
    rowCount: z.number().int(),
    format: z.enum(['csv', 'json']),
    readingIds: z.array(z.uuid()).optional(),
    replayed: z.boolean(),
  })
  .openapi('ReadingImportSummary', { example: { importId: '0b5f8f7e-3c1d-4b8e-9a43-5f1e2d6c7a90', rowCount: 2, format: 'csv', readingIds: ['4c1e9a2b-7d3f-4e8a-9b1c-2d3e4f5a6b7c', '5d2f0b3c-8e4a-4f9b-8c2d-3e4f5a6b7c8d'], replayed: false } });

// Plain OpenAPI schemas, not zod: a zod body schema would make the framework parse the JSON
// before the handler, and the import needs the exact bytes for the idempotency digest.
const importBody = {
  required: true,
  content: {
    'text/csv': { schema: { type: 'string' as const } },
    'application/json': { schema: { type: 'object' as const, required: ['readings'], properties: { readings: { type: 'array' as const, items: { $ref: '#/components/schemas/ReadingImportRow' } } } } },
  },
};

/** The body's format from its media type; a declared charset other than UTF-8 is refused too. */
function formatOf(contentType: string | undefined): 'csv' | 'json' {
  const [type = '', ...params] = (contentType ?? '').toLowerCase().split(';').map((p) => p.trim());
  const charset = params.find((p) => p.startsWith('charset='))?.slice(8).replace(/"/g, '');
  const format = type === 'text/csv' ? 'csv' : type === 'application/json' ? 'json' : undefined;
  if (!format || (charset && charset !== 'utf-8' && charset !== 'utf8')) {
    throw new HTTPException(415, { message: `Send the readings as text/csv or application/json in UTF-8, not "${contentType ?? 'no content type'}".` });
  }
  return format;
}

export function readingTransferRoutes(app: OpenAPIHono<AppEnv>): void {
  app.openAPIRegistry.register('ReadingImportRow', ReadingImportRowSchema);
  app.openapi(
    secureRoute('technician', {
      method: 'post',
      path: '/v1/readings/import',
      tags,
      summary: "Import a file of readings (CSV or JSON) from a lab's spreadsheets, all rows or none",
      description: IMPORT_DESCRIPTION,
      request: { headers: ImportHeaders, body: importBody },
      responses: {
        201: jsonResponse(ImportSummarySchema, 'The import and its readings were stored'),
        200: jsonResponse(ImportSummarySchema, 'Replay: this Idempotency-Key already imported this body; nothing new was written'),
        409: problemResponseSpec('The Idempotency-Key was used for a different body'),
        415: problemResponseSpec('Neither text/csv nor application/json'),
      },
    }),
    async (c) => {
      const format = formatOf(c.req.header('content-type'));
      const body = new Uint8Array(await c.req.arrayBuffer());
      const summary = await importReadings(c.var.db, c.var.actor, { format, body, idempotencyKey: c.req.valid('header')['idempotency-key'] });
      return summary.replayed ? c.json(summary, 200) : c.json(summary, 201);
    },
  );
  app.openapi(
    secureRoute('viewer', {
      method: 'get',
      path: '/v1/readings/export',
      tags,
      summary: 'Export readings as CSV or JSON in the columns the import reads',
      description: EXPORT_DESCRIPTION,
      request: { query: ReadingExportQuery },
      responses: {
        200: {
          description: 'The readings, streamed as a file attachment',
          content: { 'text/csv': { schema: { type: 'string' as const } }, 'application/json': { schema: { type: 'object' as const } } },
        },
      },
    }),
    async (c) => {
      const { format, ...filters } = c.req.valid('query');
      const chunks = readingExportText(exportReadings(c.var.db, c.var.actor, filters), format);
      // The first page is read before answering so a database failure is still a problem+json.
      const first = await chunks.next();
      const encoder = new TextEncoder();
      const stream = new ReadableStream<Uint8Array>({
        start: (controller) => {
          if (!first.done) controller.enqueue(encoder.encode(first.value));
        },
        pull: async (controller) => {
          const next = await chunks.next();
          if (next.done) controller.close();
          else controller.enqueue(encoder.encode(next.value));
        },
        cancel: async () => void (await chunks.return(undefined)),
      });
      const fileName = `fringe-readings-${new Date().toISOString().slice(0, 10)}.${format}`;
      return c.body(stream, 200, {
        'content-type': format === 'csv' ? 'text/csv; charset=utf-8' : 'application/json; charset=utf-8',
        'content-disposition': `attachment; filename="${fileName}"`,
      });
    },
  );
}
