import { OpenAPIHono, z } from '@hono/zod-openapi';
import { createApiKey } from '../../db/operations/keys/createApiKey.ts';
import { listApiKeys } from '../../db/operations/keys/listApiKeys.ts';
import { revokeApiKey } from '../../db/operations/keys/revokeApiKey.ts';
import type { AppEnv } from '../AppEnv.ts';
import { IdParam } from '../schemas/idParam.ts';
import { ApiKeyRow } from '../schemas/rowSchemas.ts';
import { toJson } from '../schemas/toJson.ts';
import { jsonBody, jsonResponse } from './routeParts.ts';
import { secureRoute } from './secureRoute.ts';

const tags = ['Access'];

const KeyInput = z
  .object({ label: z.string().trim().min(1).max(120), role: z.enum(['viewer', 'technician', 'admin']) })
  .strict()
  .openapi('ApiKeyInput', { example: { label: 'polariscope bench tablet', role: 'technician' } });

const CreatedKey = ApiKeyRow.pick({ id: true, label: true, role: true, keyPrefix: true, createdAt: true })
  .extend({ secret: z.string().openapi({ description: 'Shown once; only its hash is stored.' }) })
  .openapi('CreatedApiKey');

const WhoAmI = z.object({ labId: z.uuid(), keyId: z.uuid(), role: z.enum(['viewer', 'technician', 'admin']) }).openapi('WhoAmI');

export function keyRoutes(app: OpenAPIHono<AppEnv>): void {
  app.openapi(
    secureRoute('viewer', { method: 'get', path: '/v1/whoami', tags, summary: 'The lab and role of the presented key', responses: { 200: jsonResponse(WhoAmI, 'The caller') } }),
    (c) => c.json(c.var.actor, 200),
  );
  app.openapi(
    secureRoute('admin', { method: 'get', path: '/v1/keys', tags, summary: 'List the lab\'s API keys (never their secrets)', responses: { 200: jsonResponse(z.array(ApiKeyRow), 'The keys') } }),
    async (c) => c.json(toJson(await listApiKeys(c.var.db, c.var.actor)), 200),
  );
  app.openapi(
    secureRoute('admin', { method: 'post', path: '/v1/keys', tags, summary: 'Issue a key; its secret is shown once', request: { body: jsonBody(KeyInput) }, responses: { 201: jsonResponse(CreatedKey, 'The new key with its secret') } }),
    async (c) => c.json(toJson(await createApiKey(c.var.db, c.var.actor.labId, c.req.valid('json'))), 201),
  );
  app.openapi(
    secureRoute('admin', { method: 'post', path: '/v1/keys/{id}/revoke', tags, summary: 'Revoke a key at once', request: { params: IdParam }, responses: { 200: jsonResponse(ApiKeyRow, 'The revoked key') } }),
    async (c) => c.json(toJson(await revokeApiKey(c.var.db, c.var.actor, c.req.valid('param').id)), 200),
  );
}
