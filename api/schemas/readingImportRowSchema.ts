import { z } from '@hono/zod-openapi';
import { CreateReadingInput } from '../../db/inputs/readings.ts';

const ignored = (what: string) => ({ description: `written by an export; ignored on import (${what})` });

/**
 * One row of a JSON import as documented: a reading's inputs, its site by id or by model code
 * and site label, and the keys an export writes beside them, so an export imports as it is.
 * The import reads the bytes itself (for the idempotency digest); this schema documents them.
 */
export const ReadingImportRowSchema = z
  .object({
    ...CreateReadingInput.shape,
    modelCode: z.string().max(60).optional(),
    siteLabel: z.string().max(60).optional(),
    siteId: z.unknown().optional().openapi({ description: 'the site\'s UUID; give it, or modelCode and siteLabel, not both (null or empty counts as not given)' }),
    fringeOrder: z.number().nullable().optional().openapi({ description: 'if given, must agree with the value derived from the raw inputs' }),
    retardationNm: z.number().nullable().optional().openapi({ description: 'if given, must agree with the value derived from the raw inputs' }),
    id: z.string().max(100).nullable().optional().openapi({ description: 'the exported reading\'s id; names the row for supersedesId within the file, and is not kept (the reading gets a new id)' }),
    fringeOrderUncertainty: z.unknown().optional().openapi(ignored('derived')),
    supersedesId: z.string().max(100).nullable().optional().openapi({ description: 'the id of another row of this file that this row amends (same site, one successor each); an id not in the file is dropped' }),
    amendmentReason: z.string().max(500).nullable().optional().openapi({ description: 'why the amended reading was corrected; required with a supersedesId that names a row of the file' }),
    recordedAt: z.unknown().optional().openapi(ignored('the import records its own time')),
  })
  .strict()
  .openapi('ReadingImportRow');
