import { z } from 'zod';
import { instant, label } from './common.ts';

export const READING_STAGES = ['before_load', 'under_load', 'after_unload', 'before_anneal', 'after_anneal', 'inspection'] as const;
export const READING_METHODS = ['whole_order', 'tardy', 'senarmont', 'compensator', 'direct'] as const;
export const READING_SIGNS = ['positive', 'negative', 'unknown'] as const;

const order = z.number().int().min(0).max(200);
const rotationDeg = z.number().min(0).max(180);

/** Mirrors src/optics/ReadingMethodInput: the raw inputs of each reading method. */
export const ReadingMethodInputSchema = z.discriminatedUnion('method', [
  z.object({ method: z.literal('whole_order'), wholeOrder: order }).strict(),
  z.object({ method: z.literal('tardy'), lowerOrder: order, analyzerRotationDeg: rotationDeg, movedFringe: z.enum(['lower', 'upper']) }).strict(),
  z.object({ method: z.literal('senarmont'), wholeOrder: order, analyzerRotationDeg: rotationDeg }).strict(),
  z.object({ method: z.literal('compensator'), retardationNm: z.number().min(0).max(150_000) }).strict(),
  z.object({ method: z.literal('direct'), fringeOrder: z.number().min(0).max(200) }).strict(),
]);

const readingFields = {
  stage: z.enum(READING_STAGES),
  loadN: z.number().positive().lt(1e7).optional(),
  observedAt: instant,
  operator: label(100),
  /** null means white light. */
  wavelengthNm: z.number().min(380).max(780).nullable(),
  reading: ReadingMethodInputSchema,
  sign: z.enum(READING_SIGNS).default('unknown'),
  uncertaintyFringes: z.number().positive().max(10).optional(),
  notes: z.string().trim().max(2000).optional(),
};

const loadMatchesStage = (r: { stage: string; loadN?: number | undefined }, ctx: z.RefinementCtx) => {
  if (r.stage === 'under_load' && r.loadN === undefined) ctx.addIssue({ code: 'custom', path: ['loadN'], message: 'a reading under load states the load in N' });
  if (r.stage !== 'under_load' && r.loadN !== undefined) ctx.addIssue({ code: 'custom', path: ['loadN'], message: 'only a reading under load carries a load' });
};

export const CreateReadingInput = z.object(readingFields).strict().superRefine(loadMatchesStage);
export type CreateReadingInput = z.infer<typeof CreateReadingInput>;

export const AmendReadingInput = z
  .object({ ...readingFields, reason: label(500) })
  .strict()
  .superRefine(loadMatchesStage);
export type AmendReadingInput = z.infer<typeof AmendReadingInput>;

export const ReadingListQuery = z.object({
  limit: z.coerce.number().int().min(1).max(200).default(50),
  cursor: z.string().max(200).optional(),
  stage: z.enum(READING_STAGES).optional(),
  includeSuperseded: z.enum(['true', 'false']).default('false').transform((v) => v === 'true'),
});
