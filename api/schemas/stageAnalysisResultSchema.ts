import { z } from '@hono/zod-openapi';
import { MeasuredValue, StressKindSchema } from './calcResultSchemas.ts';

// Mirrors src/residual/SiteStagesTypes.ts and src/acceptance/FitnessTypes.ts as documented JSON.
const StageNameSchema = z.enum(['fabrication', 'underLoad', 'afterUnload', 'beforeAnneal', 'afterAnneal']);
const signInfo = { stagesWithAssumedSign: z.array(StageNameSchema), signNote: z.string().optional() };

const OrderQuantity = z
  .object({ order: MeasuredValue, stress: z.object({ stressMPa: MeasuredValue, kind: StressKindSchema }), ...signInfo })
  .openapi('StageOrderQuantity');

const RatioQuantity = z
  .discriminatedUnion('defined', [
    z.object({ defined: z.literal(true), ratio: MeasuredValue, ...signInfo }),
    z.object({ defined: z.literal(false), reason: z.string(), ...signInfo }),
  ])
  .openapi('StageRatioQuantity');

const shareCommon = { coverageFactor: z.number(), possibleRelaxationOrSignReversal: z.boolean(), ...signInfo };
const PermanentSetShare = z.discriminatedUnion('defined', [
  z.object({ defined: z.literal(true), share: MeasuredValue, notes: z.array(z.string()), ...shareCommon }),
  z.object({ defined: z.literal(false), reason: z.string(), ...shareCommon }),
]);

const stageEntries = Object.fromEntries(StageNameSchema.options.map((s) => [s, OrderQuantity.optional()])) as Record<z.infer<typeof StageNameSchema>, z.ZodOptional<typeof OrderQuantity>>;

const SiteStagesAnalysisSchema = z
  .object({
    coverageFactor: z.number(),
    stressKind: StressKindSchema,
    stages: z.object(stageEntries),
    fabricationResidual: OrderQuantity.optional(),
    loadCorrected: OrderQuantity.extend({
      loadN: z.number(),
      validity: z.enum(['valid_at_free_boundary', 'valid_only_if_principal_directions_agree']),
      validityNote: z.string(),
    }).optional(),
    permanentSet: OrderQuantity.optional(),
    permanentSetShare: PermanentSetShare.optional(),
    inelasticFractionOfPeak: RatioQuantity.optional(),
    annealRelief: RatioQuantity.optional(),
    notes: z.array(z.string()),
  })
  .openapi('SiteStagesAnalysis');

const GuardBand = z.object({
  decision: z.enum(['conforming', 'not_conforming', 'undecided']),
  value: z.number(),
  limit: z.number(),
  coverageFactor: z.number(),
  expandedUncertainty: z.number(),
  acceptanceZoneUpperBound: z.number(),
  rejectionZoneLowerBound: z.number(),
});
const CriterionNameSchema = z.enum(['maxResidualFringeOrder', 'maxResidualStressMPa', 'maxResidualFractionOfTestOrder']);
const CriterionResult = z.discriminatedUnion('evaluated', [
  z.object({ criterion: CriterionNameSchema, evaluated: z.literal(true), limit: z.number(), judged: MeasuredValue, guardBand: GuardBand }),
  z.object({ criterion: CriterionNameSchema, evaluated: z.literal(false), limit: z.number(), decision: z.literal('undecided'), reason: z.string() }),
]);

const StageFitnessSchema = z
  .object({
    rule: z.string(),
    judgedStage: StageNameSchema.nullable(),
    residualOrder: MeasuredValue.nullable(),
    residualStressMPa: MeasuredValue.nullable(),
    criteriaSource: z.enum(['given', 'common_practice_default']),
    criteriaFlag: z.string().optional(),
    criteria: z.object({ maxResidualFringeOrder: z.number().optional(), maxResidualStressMPa: z.number().optional(), maxResidualFractionOfTestOrder: z.number().optional() }),
    testFringeOrderEstimate: z.object({ nominalStressMPa: MeasuredValue, rootStressMPa: MeasuredValue, testFringeOrder: MeasuredValue }).nullable(),
    assessment: z
      .object({ decision: z.enum(['conforming', 'needs_annealing', 'undecided']), coverageFactor: z.number(), criteria: z.array(CriterionResult) })
      .nullable(),
    notes: z.array(z.string()),
  })
  .openapi('StageFitness');

export const StageAnalysisCalcResultSchema = z.object({ analysis: SiteStagesAnalysisSchema, fitness: StageFitnessSchema }).openapi('StageAnalysisCalcResult', {
  example: {
    analysis: {
      coverageFactor: 2,
      stressKind: 'edge_stress',
      stages: { afterAnneal: { order: { value: 0.08, uncertainty: 0.02 }, stress: { stressMPa: { value: 0.0933, uncertainty: 0.0235 }, kind: 'edge_stress' }, stagesWithAssumedSign: [] } },
      notes: ['coverage factor k = 2 for every "within its uncertainty of zero" test'],
    },
    fitness: {
      rule: 'the residual judged is the one the model carries now: the latest reading present ... taken without load',
      judgedStage: 'afterAnneal',
      residualOrder: { value: 0.08, uncertainty: 0.02 },
      residualStressMPa: { value: 0.0933, uncertainty: 0.0235 },
      criteriaSource: 'common_practice_default',
      criteriaFlag: '[M] common practice: below about 0.1–0.2 fringe, or 5–10 % of the largest test order',
      criteria: { maxResidualFringeOrder: 0.2 },
      testFringeOrderEstimate: null,
      assessment: {
        decision: 'conforming',
        coverageFactor: 2,
        criteria: [
          {
            criterion: 'maxResidualFringeOrder',
            evaluated: true,
            limit: 0.2,
            judged: { value: 0.08, uncertainty: 0.02 },
            guardBand: { decision: 'conforming', value: 0.08, limit: 0.2, coverageFactor: 2, expandedUncertainty: 0.04, acceptanceZoneUpperBound: 0.16, rejectionZoneLowerBound: 0.24 },
          },
        ],
      },
      notes: ['no criteria given: common-practice limits used; the fraction-of-test-order criterion was left out because no planned test was given'],
    },
  },
});
