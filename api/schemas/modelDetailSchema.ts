import { z } from '@hono/zod-openapi';
import { BatchRow, MaterialRow, ModelEventRow, ModelRow, SiteRow } from './rowSchemas.ts';

export const ModelDetailSchema = z
  .object({
    model: ModelRow,
    batch: BatchRow,
    material: MaterialRow,
    sites: z.array(SiteRow),
    timeline: z.array(ModelEventRow),
    derived: z.object({
      lastMachinedAt: z.iso.datetime().nullable(),
      hoursSinceMachining: z.number().nullable(),
      lastMachiningMethod: z.string().nullable(),
      storage: z.object({ since: z.iso.datetime(), temperatureC: z.number().nullable(), relativeHumidityPct: z.number().nullable() }).nullable(),
    }),
  })
  .openapi('ModelDetail');
