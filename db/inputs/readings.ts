import { z } from 'zod';
import { instant, label } from './common.ts';

export const READING_STAGES = ['before_load', 'under_load', 'after_unload', 'before_anneal', 'after_anneal', 'inspection'] as const;
export const READING_METHODS = ['whole_order', 'tardy', 'senarmont', 'compensator', 'direct', 'white_light_colour'] as const;
export const READING_SIGNS = ['positive', 'negative', 'unknown'] as const;

const order = z.number().int().min(0).max(200);
const rotationDeg = z.number().min(0).max(180);
const COLOUR_FIELDS = ['srgbHex', 'namedColour', 'retardationNm'] as const;

// One object with a refinement rather than three union members, so a body naming two colours
// gets "exactly one" instead of a vague union mismatch.
const whiteLightColour = z
  .object({
    method: z.literal('white_light_colour'),
    srgbHex: z.string().trim().regex(/^#?([0-9a-f]{3}|[0-9a-f]{6})$/i, "an sRGB hex colour like '#a1b2c3'").optional(),
    namedColour: z.string().trim().min(1).max(60).optional(),
    retardationNm: z.number().min(0).max(2000).optional(),
    illuminant: z.enum(['D65', 'A', 'E']).optional(),
  })
  .strict()
  .superRefine((r, ctx) => {
    const given = COLOUR_FIELDS.filter((f) => r[f] !== undefined);
    if (given.length !== 1) ctx.addIssue({ code: 'custom', path: given.length === 0 ? [] : [given[1]!], message: `give exactly one of ${COLOUR_FIELDS.join(', ')}` });
  });

/** Mirrors src/optics/ReadingMethodInput: the raw inputs of each reading method. */
export const ReadingMethodInputSchema = z.discriminatedUnion('method', [
  z.object({ method: z.literal('whole_order'), wholeOrder: order }).strict(),
  z.object({ method: z.literal('tardy'), lowerOrder: order, analyzerRotationDeg: rotationDeg, movedFringe: z.enum(['lower', 'upper']) }).strict(),
  z.object({ method: z.literal('senarmont'), wholeOrder: order, analyzerRotationDeg: rotationDeg }).strict(),
  z.object({ method: z.literal('compensator'), retardationNm: z.number().min(0).max(150_000) }).strict(),
  z.object({ method: z.literal('direct'), fringeOrder: z.number().min(0).max(200) }).strict(),
  whiteLightColour,
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

const stageAndLightAgree = (r: { stage: string; loadN?: number | undefined; wavelengthNm: number | null; reading: { method: string } }, ctx: z.RefinementCtx) => {
  if (r.reading.method === 'white_light_colour' && r.wavelengthNm !== null) ctx.addIssue({ code: 'custom', path: ['wavelengthNm'], message: 'a white-light colour reading is made in white light: wavelengthNm must be null' });
  if (r.stage === 'under_load' && r.loadN === undefined) ctx.addIssue({ code: 'custom', path: ['loadN'], message: 'a reading under load states the load in N' });
  if (r.stage !== 'under_load' && r.loadN !== undefined) ctx.addIssue({ code: 'custom', path: ['loadN'], message: 'only a reading under load carries a load' });
};

export const CreateReadingInput = z.object(readingFields).strict().superRefine(stageAndLightAgree);
export type CreateReadingInput = z.infer<typeof CreateReadingInput>;

export const AmendReadingInput = z
  .object({ ...readingFields, reason: label(500) })
  .strict()
  .superRefine(stageAndLightAgree);
export type AmendReadingInput = z.infer<typeof AmendReadingInput>;

export const ReadingListQuery = z.object({
  limit: z.coerce.number().int().min(1).max(200).default(50),
  cursor: z.string().max(200).optional(),
  stage: z.enum(READING_STAGES).optional(),
  includeSuperseded: z.enum(['true', 'false']).default('false').transform((v) => v === 'true'),
});
