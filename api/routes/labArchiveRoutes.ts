import { type OpenAPIHono, z } from '@hono/zod-openapi';
import { HTTPException } from 'hono/http-exception';
import { importLabArchive } from '../../db/archive/importLabArchive.ts';
import { labArchiveStream } from '../../db/archive/labArchiveStream.ts';
import type { AppEnv } from '../AppEnv.ts';
import { problemResponseSpec } from '../schemas/problemSchema.ts';
import { jsonResponse } from './routeParts.ts';
import { secureRoute } from './secureRoute.ts';

const tags = ['Lab archive'];
const archiveContent = { 'application/gzip': { schema: { type: 'string' as const, format: 'binary' } } };

const ImportSummarySchema = z
  .object({
    labId: z.uuid(),
    labName: z.string(),
    archivedLabId: z.uuid(),
    parts: z.array(z.object({ name: z.string(), rows: z.number().int() })),
    totalRows: z.number().int(),
    schema: z.object({ archive: z.string(), database: z.string(), upgradedThrough: z.array(z.string()) }),
    repointedSharedReferences: z.number().int(),
  })
  .openapi('LabImportSummary');

const EXPORT_DESCRIPTION = `The caller's whole lab as one archive file (gzip): every record of every lab table, amendments
included, read in one consistent snapshot and streamed in pages. API keys are never included. The
format is described in DEVELOPERS.md ("Lab archive format"); \`npm run lab:import\` restores it.`;

const IMPORT_DESCRIPTION = `Restores an archive into the caller's lab, which must hold no records yet (the catalogue
materials every new lab starts with are replaced by the archive's). All or nothing: the archive's
format, schema version, every part's row count and SHA-256 are checked before any record is
written. Records keep their ids, so an archive whose records already exist here is refused (409).
The body is limited to IMPORT_LIMIT_BYTES; larger labs move with \`npm run lab:import\`.`;

export function labArchiveRoutes(app: OpenAPIHono<AppEnv>): void {
  app.openapi(
    secureRoute('admin', {
      method: 'get',
      path: '/v1/lab/archive',
      tags,
      summary: "Export the caller's whole lab as one archive file",
      description: EXPORT_DESCRIPTION,
      responses: { 200: { description: 'The archive, streamed as a file attachment', content: archiveContent } },
    }),
    (c) => {
      const fileName = `lab-${new Date().toISOString().slice(0, 10)}.flarchive`;
      return c.body(labArchiveStream(c.var.db, c.var.actor.labId), 200, {
        'content-type': 'application/gzip',
        'content-disposition': `attachment; filename="${fileName}"`,
      });
    },
  );
  app.openapi(
    secureRoute('admin', {
      method: 'post',
      path: '/v1/lab/archive/import',
      tags,
      summary: "Restore an archive into the caller's lab while it has no records",
      description: IMPORT_DESCRIPTION,
      request: { body: { required: true, content: archiveContent } },
      responses: {
        201: jsonResponse(ImportSummarySchema, 'Every record of the archive was restored'),
        409: problemResponseSpec('The lab already has records, or records of the archive already exist here'),
      },
    }),
    async (c) => {
      const body = c.req.raw.body;
      if (!body) throw new HTTPException(400, { message: 'Send the archive file as the request body.' });
      const summary = await importLabArchive(c.var.db, { labId: c.var.actor.labId }, body as unknown as AsyncIterable<Uint8Array>);
      return c.json(summary, 201);
    },
  );
}
