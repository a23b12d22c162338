import { z } from 'zod';
import { instant, label } from './common.ts';
import { MATERIAL_FAMILIES } from './materials.ts';

// The guidance entry itself is checked by validateGuidanceEntry in the domain core, which
// names every bad field at once; here it only has to be a JSON object.
const guidanceEntry = z.record(z.string(), z.unknown());
const materialFamily = z.enum(MATERIAL_FAMILIES);
const reason = label(500);

export const GuidanceListQuery = z.object({
  materialFamily: materialFamily.optional(),
  includeSuperseded: z.enum(['true', 'false']).default('false').transform((v) => v === 'true'),
});
export type GuidanceListQuery = z.infer<typeof GuidanceListQuery>;

export const CreateGuidanceEntryInput = z
  .object({
    entry: guidanceEntry,
    /** Needed only when the entry's own family is 'other': which material family it serves. */
    appliesToFamily: materialFamily.optional(),
  })
  .strict();
export type CreateGuidanceEntryInput = z.infer<typeof CreateGuidanceEntryInput>;

export const AmendGuidanceEntryInput = z.object({ entry: guidanceEntry, reason }).strict();
export type AmendGuidanceEntryInput = z.infer<typeof AmendGuidanceEntryInput>;

export const SetHouseCycleInput = z
  .object({ materialFamily, guidanceEntryId: z.uuid(), reason: z.string().trim().max(500).optional() })
  .strict();
export type SetHouseCycleInput = z.infer<typeof SetHouseCycleInput>;

export const HouseCycleQuery = z.object({ materialFamily: materialFamily.optional() });
export type HouseCycleQuery = z.infer<typeof HouseCycleQuery>;

export const OvenLimitsInput = z
  .object({
    maxTemperatureC: z.number().positive().max(1600).optional(),
    maxHeatingRateCPerH: z.number().positive().max(2000).optional(),
    maxCoolingRateCPerH: z.number().positive().max(2000).optional(),
    minRateCPerH: z.number().positive().max(2000).optional(),
  })
  .strict();

const supersedesWithReason = (b: { supersedesPlanId?: string | undefined; reason?: string | undefined }, ctx: z.RefinementCtx) => {
  if ((b.supersedesPlanId === undefined) !== (b.reason === undefined)) {
    ctx.addIssue({ code: 'custom', path: ['reason'], message: 'a plan that supersedes another states why, and a reason needs the plan it supersedes' });
  }
};

export const GeneratePlanInput = z
  .object({
    guidanceEntryId: z.uuid().optional(),
    maxSectionThicknessMm: z.number().positive().max(300).optional(),
    startTemperatureC: z.number().min(-40).max(60).optional(),
    ovenLimits: OvenLimitsInput.optional(),
    supersedesPlanId: z.uuid().optional(),
    reason: reason.optional(),
  })
  .strict()
  .superRefine(supersedesWithReason);
export type GeneratePlanInput = z.infer<typeof GeneratePlanInput>;

export const ExportFormatQuery = z.object({ format: z.enum(['json', 'csv']).default('json') });

const runFields = {
  planId: z.uuid(),
  ovenName: label(120),
  modelIds: z
    .array(z.uuid())
    .min(1)
    .max(100)
    .refine((ids) => new Set(ids).size === ids.length, 'a model appears only once in a load'),
  operator: label(100),
  startedAt: instant,
  notes: z.string().trim().max(2000).optional(),
};

export const CreateRunInput = z.object(runFields).strict();
export type CreateRunInput = z.infer<typeof CreateRunInput>;

export const AmendRunInput = z.object({ ...runFields, reason }).strict();
export type AmendRunInput = z.infer<typeof AmendRunInput>;

export const RunListQuery = z.object({
  limit: z.coerce.number().int().min(1).max(200).default(50),
  cursor: z.string().max(200).optional(),
  modelId: z.uuid().optional(),
});
export type RunListQuery = z.infer<typeof RunListQuery>;

// Comparison tolerances a lab may widen for its own oven and logger (defaults in compareOvenLog).
const tolerance = (max: number) => z.coerce.number().positive().max(max).optional();

export const OvenLogImportQuery = z
  .object({
    supersedesLogId: z.uuid().optional(),
    reason: reason.optional(),
    rateWindowH: tolerance(6),
    deviationC: tolerance(50),
    overshootC: tolerance(50),
    soakBandC: tolerance(50),
  })
  .superRefine((q, ctx) => {
    if ((q.supersedesLogId === undefined) !== (q.reason === undefined)) {
      ctx.addIssue({ code: 'custom', path: ['reason'], message: 'a log that supersedes another states why, and a reason needs the log it supersedes' });
    }
  });
export type OvenLogImportQuery = z.infer<typeof OvenLogImportQuery>;

/** How far before a run's start and after its planned end a reading still belongs to it, h. */
const windowH = z.coerce.number().positive().max(24 * 90).default(24 * 14);

export const EffectivenessQuery = z.object({ windowH });
export type EffectivenessQuery = z.infer<typeof EffectivenessQuery>;

export const EffectivenessHistoryQuery = z.object({ windowH, materialFamily: materialFamily.optional() });
export type EffectivenessHistoryQuery = z.infer<typeof EffectivenessHistoryQuery>;

export const RecommendationQuery = z.object({ windowH, maxSectionThicknessMm: z.coerce.number().positive().max(300).optional() });
export type RecommendationQuery = z.infer<typeof RecommendationQuery>;
