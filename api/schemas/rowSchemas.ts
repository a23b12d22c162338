import { z } from '@hono/zod-openapi';
import { createSelectSchema } from 'drizzle-zod';
import { apiKeys, batches, materials, modelEvents, models, readings, sites } from '../../db/schema/index.ts';

// Tier 1: the stored rows as clients see them (timestamps as ISO strings), derived from drizzle.
const at = z.iso.datetime();
const atOrNull = z.iso.datetime().nullable();

export const MaterialRow = createSelectSchema(materials, { createdAt: at }).openapi('Material');
export const BatchRow = createSelectSchema(batches, { createdAt: at, madeOn: atOrNull }).openapi('Batch');
export const ModelRow = createSelectSchema(models, { createdAt: at }).openapi('Model');
export const SiteRow = createSelectSchema(sites, { createdAt: at }).openapi('Site');
export const ModelEventRow = createSelectSchema(modelEvents, { occurredAt: at, recordedAt: at }).openapi('ModelEvent');
export const ReadingRow = createSelectSchema(readings, { observedAt: at, recordedAt: at }).openapi('Reading');
export const ApiKeyRow = createSelectSchema(apiKeys, { createdAt: at, revokedAt: atOrNull })
  .omit({ keyHash: true, labId: true })
  .openapi('ApiKey');

export const pageOf = <T extends z.ZodTypeAny>(item: T, name: string) =>
  z.object({ items: z.array(item), nextCursor: z.string().nullable() }).openapi(name);
