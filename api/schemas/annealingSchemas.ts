import { z } from '@hono/zod-openapi';
import { createSelectSchema } from 'drizzle-zod';
import { AmendGuidanceEntryInput, AmendRunInput, CreateGuidanceEntryInput, CreateRunInput, GeneratePlanInput, SetHouseCycleInput } from '../../db/inputs/annealing.ts';
import { annealingGuidanceEntries, annealingHouseCycles, annealingPlans, annealingRuns, ovenLogs } from '../../db/schema/index.ts';

const at = z.iso.datetime();
const json = z.record(z.string(), z.unknown());
const EXAMPLE_ID = '0b5f8f7e-3c1d-4b8e-9a43-5f1e2d6c7a90';

// An invented lab practice, sourced the way the catalogue's entries are.
const labPractice = { document: 'Lab annealing notebook, polycarbonate trials', locator: 'house practice sheet 3', flag: 'common_practice' };
const EXAMPLE_ENTRY = {
  key: 'polycarbonate-sheet.house-135',
  title: 'Polycarbonate sheet: house cycle, 135 °C soak',
  materialFamily: 'polycarbonate',
  heating: [],
  heatingRateToSoak: { kind: 'fixed', rateCPerH: { value: 20, source: labPractice } },
  soak: { temperature: { kind: 'absolute', temperatureC: { value: 135, source: labPractice } }, time: { hoursPerMm: { value: 0.5, source: labPractice }, minimumH: { value: 3, source: labPractice } } },
  cooling: [{ rate: { kind: 'fixed', rateCPerH: { value: 4, source: labPractice } }, to: { kind: 'absolute', temperatureC: { value: 40, source: labPractice } } }],
  thermalDiffusivityMm2PerS: { value: 0.144, source: { document: 'k/(ρ·cp) of the catalogue polycarbonate', locator: 'material record', flag: 'derived' } },
  allowedGradientC: { value: 2, source: labPractice },
};

export const GuidanceEntryInputSchema = CreateGuidanceEntryInput.openapi('GuidanceEntryInput', {
  description: 'entry has the shape of the published entries (GET /v1/annealing/guidance shows them), with a source on every number.',
  example: { entry: EXAMPLE_ENTRY },
});
export const GuidanceAmendmentInputSchema = AmendGuidanceEntryInput.openapi('GuidanceAmendmentInput', {
  example: { entry: { ...EXAMPLE_ENTRY, cooling: [{ ...EXAMPLE_ENTRY.cooling[0], rate: { kind: 'fixed', rateCPerH: { value: 3, source: labPractice } } }] }, reason: 'Cooling slowed to 3 °C/h after two 10 mm models showed edge fringes.' },
});
export const HouseCycleInputSchema = SetHouseCycleInput.openapi('HouseCycleInput', {
  example: { materialFamily: 'polycarbonate', guidanceEntryId: EXAMPLE_ID, reason: 'Shorter cycle, same relief in our trials.' },
});
export const PlanInputSchema = GeneratePlanInput.openapi('AnnealingPlanInput', {
  description: 'All fields optional: without guidanceEntryId the house cycle (else the published default) for the model\'s material is used; without a thickness, the model\'s own.',
  example: { maxSectionThicknessMm: 6.1, ovenLimits: { maxHeatingRateCPerH: 60, minRateCPerH: 1 } },
});
export const RunInputSchema = CreateRunInput.openapi('AnnealingRunInput', {
  example: { planId: EXAMPLE_ID, ovenName: 'Oven 2 (forced air)', modelIds: [EXAMPLE_ID], operator: 'T. Haddad', startedAt: '2026-11-24T07:30:00Z' },
});
export const RunAmendmentInputSchema = AmendRunInput.openapi('AnnealingRunAmendmentInput', {
  example: { planId: EXAMPLE_ID, ovenName: 'Oven 1 (forced air)', modelIds: [EXAMPLE_ID], operator: 'T. Haddad', startedAt: '2026-11-24T07:30:00Z', reason: 'The load went into oven 1, not oven 2.' },
});

const successor = { supersededById: z.uuid().nullable() };

export const GuidanceEntrySchema = createSelectSchema(annealingGuidanceEntries, { createdAt: at, entry: json })
  .extend({ origin: z.enum(['published', 'lab']), ...successor })
  .openapi('AnnealingGuidanceEntry');

export const HouseCycleSchema = createSelectSchema(annealingHouseCycles, { createdAt: at })
  .extend({ guidanceKey: z.string(), guidanceTitle: z.string(), inForce: z.boolean().optional() })
  .openapi('AnnealingHouseCycle');

export const PlanSchema = createSelectSchema(annealingPlans, { createdAt: at, plan: json, ovenLimits: z.record(z.string(), z.number()) })
  .extend({ ...successor, cautions: z.array(z.string()) })
  .openapi('AnnealingPlanRecord', {
    description: 'plan holds the segments (ramp/soak, °C, °C/h, h), slab checks of every ramp and soak, warnings, notes, sources and cautions.',
  });

const RunModel = z.object({ id: z.uuid(), code: z.string(), thicknessMm: z.number() });
export const RunSchema = createSelectSchema(annealingRuns, { createdAt: at, startedAt: at })
  .extend({
    ...successor,
    plannedEndAt: at,
    plan: z.object({ id: z.uuid(), guidanceKey: z.string(), catalogueVersion: z.string().nullable(), totalDurationH: z.number(), maxTemperatureC: z.number() }),
    models: z.array(RunModel),
    currentLog: z.object({ id: z.uuid(), verdict: z.string(), sampleCount: z.number(), importedAt: at, reasons: z.array(z.string()) }).nullable(),
    cautions: z.array(z.string()),
    warnings: z.array(z.string()).optional(),
  })
  .openapi('AnnealingRun');

export const RunListItemSchema = createSelectSchema(annealingRuns, { createdAt: at, startedAt: at }).extend(successor).openapi('AnnealingRunListItem');

export const OvenLogSchema = createSelectSchema(ovenLogs, { importedAt: at, comparison: json })
  .extend({ ...successor, cautions: z.array(z.string()).optional() })
  .openapi('OvenLog', {
    description: 'comparison: verdict (pass, pass_with_remarks, fail), reasons, findings (kind, severity, atH, numbers), soak holds, deviation statistics, tolerances and notes.',
  });

const relief = z.union([z.object({ defined: z.literal(true), ratio: z.object({ value: z.number(), uncertainty: z.number() }) }), z.object({ defined: z.literal(false), reason: z.string() })]);
const stageReading = z.object({ readingId: z.uuid(), fringeOrder: z.number(), uncertainty: z.number(), observedAt: at }).nullable();

export const RunEffectivenessSchema = z
  .object({
    runId: z.uuid(),
    planId: z.uuid(),
    guidanceKey: z.string(),
    logVerdict: z.string().nullable(),
    window: z.object({ beforeFrom: at, startedAt: at, plannedEndAt: at, afterUntil: at, windowH: z.number() }),
    models: z.array(
      z.object({
        modelId: z.uuid(),
        modelCode: z.string(),
        verdict: z.enum(['within_limit', 'over_limit', 'undecided', 'not_measured']),
        sites: z.array(z.object({ siteId: z.uuid(), siteLabel: z.string(), before: stageReading, after: stageReading, relief, limitFringeOrder: z.number(), limitSource: z.string(), coverageFactor: z.number(), afterDecision: z.string().nullable() })),
      }),
    ),
    summary: z.object({ sitesWithRelief: z.number(), meanRelief: z.number().nullable(), modelsMeasured: z.number(), modelsWithinLimit: z.number() }),
    notes: z.array(z.string()),
  })
  .openapi('AnnealingRunEffectiveness');

export const EffectivenessHistorySchema = z
  .array(
    z.object({
      materialId: z.uuid(),
      materialName: z.string(),
      materialFamily: z.string(),
      guidanceKey: z.string(),
      runs: z.number(),
      modelsMeasured: z.number(),
      modelsWithinLimit: z.number(),
      modelsOverLimit: z.number(),
      withinLimitFraction: z.number().nullable(),
      sitesWithRelief: z.number(),
      medianRelief: z.number().nullable(),
      minRelief: z.number().nullable(),
      maxRelief: z.number().nullable(),
      limitSources: z.array(z.string()),
      limitNote: z.string().nullable(),
    }),
  )
  .openapi('AnnealingEffectivenessHistory');

export const RecommendationSchema = z
  .looseObject({
    decision: z.enum(['conforming', 'needs_annealing', 'undecided', 'no_readings']),
    needsAnnealing: z.boolean().nullable(),
    why: z.string(),
    cycle: z.object({ guidanceEntryId: z.uuid(), key: z.string(), title: z.string(), origin: z.enum(['published', 'lab']), catalogueVersion: z.string().nullable(), chosenBy: z.enum(['requested', 'house_cycle', 'published_default']) }),
    maxSectionThicknessMm: z.number(),
    plan: json.describe('the generated plan (not stored; POST .../annealing-plans stores one)'),
    history: EffectivenessHistorySchema.element.nullable(),
    historySummary: z.string(),
    cautions: z.array(z.string()),
  })
  .openapi('AnnealingRecommendation');
