import { z } from '@hono/zod-openapi';
import { ReadingMethodInputSchema } from '../../db/inputs/readings.ts';

// Request bodies of the stateless calculators. Ranges are the physical ones a lab meets; the
// domain core re-checks everything, so these bounds exist to name the field in a 422 early.
const wavelengthNm = z.number().min(380).max(780);
const uncertainty = z.number().min(0).max(1e6);

/** A value with its standard uncertainty (k = 1), both required. */
export const measured = (value: z.ZodNumber) => z.object({ value, uncertainty }).strict();

/** A value whose uncertainty may be left out; the calculator then takes it as exact and says so. */
export const measuredOrExact = (value: z.ZodNumber) => z.object({ value, uncertainty: uncertainty.optional() }).strict();

const signedOrder = z.number().min(-200).max(200);
const unsignedOrder = z.number().min(0).max(200);
const fringeValue = z.number().positive().max(5000);
const thickness = z.number().positive().max(300);
const load = z.number().positive().lt(1e7);
const lengthMm = z.number().positive().max(5000);

export const FringeOrderCalcInputSchema = z
  .object({
    reading: ReadingMethodInputSchema,
    wavelengthNm: wavelengthNm.nullable().openapi({ description: 'null means white light (read at the tint of passage, 577 nm).' }),
    uncertaintyFringes: z.number().min(0).max(10).optional().openapi({ description: "Overrides the method's default reading uncertainty." }),
  })
  .strict()
  .openapi('FringeOrderCalcInput', {
    example: { reading: { method: 'tardy', lowerOrder: 2, analyzerRotationDeg: 63, movedFringe: 'lower' }, wavelengthNm: 546.1 },
  });

export const EdgeStressCalcInputSchema = z
  .object({
    fringeOrder: measured(signedOrder).openapi({ description: 'Signed (tension positive) or a magnitude; the stress carries its sign.' }),
    fringeValueNPerMm: z
      .object({ value: fringeValue, uncertainty, quotedAtWavelengthNm: wavelengthNm.optional() })
      .strict()
      .openapi({ description: 'Material stress fringe value fσ, N/mm per fringe (= kN/m per fringe).' }),
    readingWavelengthNm: wavelengthNm.nullable().optional().openapi({ description: 'Wavelength of the reading (null = white light, 577 nm); with quotedAtWavelengthNm, fσ is converted to it.' }),
    thicknessMm: measured(thickness),
    onFreeEdge: z.boolean().default(true),
  })
  .strict()
  .superRefine((b, ctx) => {
    const quoted = b.fringeValueNPerMm.quotedAtWavelengthNm !== undefined;
    const read = b.readingWavelengthNm !== undefined;
    if (quoted && !read) ctx.addIssue({ code: 'custom', path: ['readingWavelengthNm'], message: 'needed to convert a fringe value quoted at another wavelength' });
    if (read && !quoted) ctx.addIssue({ code: 'custom', path: ['fringeValueNPerMm', 'quotedAtWavelengthNm'], message: 'state the wavelength the fringe value is quoted at, or leave out readingWavelengthNm' });
  })
  .openapi('EdgeStressCalcInput', {
    example: {
      fringeOrder: { value: 1.5, uncertainty: 0.02 },
      fringeValueNPerMm: { value: 10.0, uncertainty: 0.3, quotedAtWavelengthNm: 577 },
      readingWavelengthNm: 546.1,
      thicknessMm: { value: 5.0, uncertainty: 0.02 },
      onFreeEdge: true,
    },
  });

const unsignedOnlyIfSignUnknown = (r: { signKnown: boolean; order: { value: number } }, ctx: z.RefinementCtx) => {
  if (!r.signKnown && r.order.value < 0) ctx.addIssue({ code: 'custom', path: ['order', 'value'], message: 'a reading without a known sign is a magnitude ≥ 0; set signKnown to give it a sign' });
};
const stageReading = z.object({ order: measured(signedOrder), signKnown: z.boolean().default(false) }).strict().superRefine(unsignedOnlyIfSignUnknown);
const loadedStageReading = z.object({ order: measured(signedOrder), signKnown: z.boolean().default(false), loadN: load }).strict().superRefine(unsignedOnlyIfSignUnknown);

export const FitnessCriteriaSchema = z
  .object({
    maxResidualFringeOrder: z.number().positive().max(10).optional(),
    maxResidualStressMPa: z.number().positive().max(1000).optional(),
    maxResidualFractionOfTestOrder: z.number().positive().max(1).optional(),
  })
  .strict()
  .refine((c) => Object.values(c).some((v) => v !== undefined), { message: 'give at least one criterion, or leave criteria out for the common-practice defaults' })
  .openapi('FitnessCriteria');

export const StageAnalysisCalcInputSchema = z
  .object({
    fabrication: stageReading.optional().openapi({ description: 'The reading before any load (the before_load stage).' }),
    underLoad: loadedStageReading.optional(),
    afterUnload: stageReading.optional(),
    beforeAnneal: stageReading.optional(),
    afterAnneal: stageReading.optional(),
    fringeValueNPerMm: measured(fringeValue),
    thicknessMm: measured(thickness),
    onFreeEdge: z.boolean().default(true),
    criteria: FitnessCriteriaSchema.optional().openapi({ description: 'Left out: the common-practice limits, flagged as such in the answer.' }),
    plannedTest: z
      .object({ plannedLoadN: measuredOrExact(load), netWidthMm: measuredOrExact(lengthMm), kt: measuredOrExact(z.number().positive().max(50)) })
      .strict()
      .optional()
      .openapi({ description: 'Estimates the test fringe order Kt·P/(w_net·fσ) for the fraction criterion; a left-out uncertainty is taken as zero.' }),
  })
  .strict()
  .superRefine((b, ctx) => {
    const stages = [b.fabrication, b.underLoad, b.afterUnload, b.beforeAnneal, b.afterAnneal];
    if (stages.every((s) => s === undefined)) ctx.addIssue({ code: 'custom', path: ['fabrication'], message: 'give at least one stage reading' });
    if (b.criteria?.maxResidualFractionOfTestOrder !== undefined && b.plannedTest === undefined) {
      ctx.addIssue({ code: 'custom', path: ['plannedTest'], message: 'maxResidualFractionOfTestOrder needs the planned test to estimate the test fringe order' });
    }
  })
  .openapi('StageAnalysisCalcInput', {
    example: {
      fabrication: { order: { value: 0.3, uncertainty: 0.02 }, signKnown: true },
      underLoad: { order: { value: 2.4, uncertainty: 0.02 }, signKnown: true, loadN: 400 },
      afterUnload: { order: { value: 0.45, uncertainty: 0.02 }, signKnown: true },
      beforeAnneal: { order: { value: 0.45, uncertainty: 0.02 }, signKnown: true },
      afterAnneal: { order: { value: 0.08, uncertainty: 0.02 }, signKnown: true },
      fringeValueNPerMm: { value: 7.0, uncertainty: 0.2 },
      thicknessMm: { value: 6.0, uncertainty: 0.05 },
      onFreeEdge: true,
      plannedTest: { plannedLoadN: { value: 400 }, netWidthMm: { value: 20, uncertainty: 0.02 }, kt: { value: 2.1, uncertainty: 0.05 } },
    },
  });

const specimenOrder = measuredOrExact(unsignedOrder).openapi({ description: 'Fringe order read on the specimen (disk centre, strip gauge length, beam outer fibre).' });
export const CalibrationSpecimenSchema = z.discriminatedUnion('specimen', [
  z.object({ specimen: z.literal('disk'), loadN: measuredOrExact(load), diameterMm: measuredOrExact(lengthMm), fringeOrder: specimenOrder }).strict(),
  z.object({ specimen: z.literal('tension_strip'), loadN: measuredOrExact(load), widthMm: measuredOrExact(lengthMm), fringeOrder: specimenOrder }).strict(),
  z
    .object({ specimen: z.literal('beam'), bendingMomentNmm: measuredOrExact(z.number().positive().max(1e10)), depthMm: measuredOrExact(lengthMm), fringeOrder: specimenOrder })
    .strict()
    .openapi({ description: 'Pure bending; M is the moment on the whole section (four-point bending: M = P·a/2). The thickness cancels.' }),
]);

export const FringeValueCalcInputSchema = z
  .object({
    wavelengthNm,
    points: z.array(CalibrationSpecimenSchema).min(1).max(200),
  })
  .strict()
  .refine((b) => b.points.length !== 2, { path: ['points'], message: 'one point gives a single-specimen value; a fit through the origin needs at least 3' })
  .openapi('FringeValueCalcInput', {
    example: {
      wavelengthNm: 577,
      points: [{ specimen: 'disk', loadN: { value: 1200, uncertainty: 6 }, diameterMm: { value: 50, uncertainty: 0.02 }, fringeOrder: { value: 5.5, uncertainty: 0.02 } }],
    },
  });

export type FringeOrderCalcInput = z.infer<typeof FringeOrderCalcInputSchema>;
export type EdgeStressCalcInput = z.infer<typeof EdgeStressCalcInputSchema>;
export type StageAnalysisCalcInput = z.infer<typeof StageAnalysisCalcInputSchema>;
export type CalibrationSpecimen = z.infer<typeof CalibrationSpecimenSchema>;
export type FringeValueCalcInput = z.infer<typeof FringeValueCalcInputSchema>;
