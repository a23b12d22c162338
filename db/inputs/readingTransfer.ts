import { z } from 'zod';
import { instant, uuid } from './common.ts';
import { READING_STAGES } from './readings.ts';

export const ReadingExportQuery = z.object({
  format: z.enum(['csv', 'json']).default('csv'),
  modelId: uuid.optional(),
  siteId: uuid.optional(),
  stage: z.enum(READING_STAGES).optional(),
  /** Observed at or after this instant. */
  from: instant.optional(),
  /** Observed before this instant. */
  to: instant.optional(),
  includeSuperseded: z.enum(['true', 'false']).default('false').transform((v) => v === 'true'),
});
export type ReadingExportQuery = z.infer<typeof ReadingExportQuery>;

/** Idempotency-Key is optional and bounded so it fits the unique index comfortably. */
export const ImportHeaders = z.object({
  'idempotency-key': z.string().trim().min(1).max(200).optional(),
});
