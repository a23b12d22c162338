import { z } from '@hono/zod-openapi';

// Answers of the stateless calculators, documented with the worked cases their tests check.
export const MeasuredValue = z.object({ value: z.number(), uncertainty: z.number() }).openapi('MeasuredValue', {
  description: 'A value with its standard uncertainty (k = 1), in the unit the field name states.',
  example: { value: 2.35, uncertainty: 0.02 },
});

export const StressKindSchema = z.enum(['edge_stress', 'principal_stress_difference']);

export const FringeOrderCalcResultSchema = z
  .object({
    fringeOrder: MeasuredValue,
    retardationNm: MeasuredValue,
    formula: z.string(),
    wavelengthNm: z.number(),
    light: z.enum(['monochromatic', 'white_light']),
    uncertaintySource: z.enum(['given', 'method_default']),
    notes: z.array(z.string()),
  })
  .openapi('FringeOrderCalcResult', {
    example: {
      fringeOrder: { value: 2.35, uncertainty: 0.02 },
      retardationNm: { value: 1283.335, uncertainty: 10.922 },
      formula: 'Tardy: N = n + β/180 = 2 + 63/180 = 2.35',
      wavelengthNm: 546.1,
      light: 'monochromatic',
      uncertaintySource: 'method_default',
      notes: ["reading uncertainty is the method's default; a lab's own repeatability study should replace it"],
    },
  });

export const EdgeStressCalcResultSchema = z
  .object({
    stressMPa: MeasuredValue,
    kind: StressKindSchema,
    fringeValueNPerMm: MeasuredValue,
    wavelengthNm: z.number().nullable(),
    formula: z.string(),
    notes: z.array(z.string()),
  })
  .openapi('EdgeStressCalcResult', {
    example: {
      stressMPa: { value: 2.8393, uncertainty: 0.0939 },
      kind: 'edge_stress',
      fringeValueNPerMm: { value: 9.4645, uncertainty: 0.2839 },
      wavelengthNm: 546.1,
      formula: 'σ = N·fσ/t',
      notes: ['fringe value converted from 577 nm in proportion to wavelength; dispersion of the stress-optic coefficient neglected'],
    },
  });

const CalibrationSchema = z.discriminatedUnion('defined', [
  z.object({ defined: z.literal(true), fringeValueNPerMm: MeasuredValue, wavelengthNm: z.number(), formula: z.string() }),
  z.object({ defined: z.literal(false), reason: z.string(), wavelengthNm: z.number() }),
]);

const FitSchema = z.object({
  fringeValueNPerMm: MeasuredValue,
  wavelengthNm: z.number(),
  residualStandardDeviationNPerMm: z.number(),
  degreesOfFreedom: z.number().int(),
  pointCount: z.number().int(),
});

export const FringeValueCalcResultSchema = z
  .object({
    wavelengthNm: z.number(),
    basis: z.enum(['single_specimen', 'fit_through_origin']),
    defined: z.boolean(),
    fringeValueNPerMm: MeasuredValue.optional(),
    reason: z.string().optional().openapi({ description: 'Why no value: the fringe order cannot be told from zero.' }),
    points: z.array(
      z.object({
        specimen: z.enum(['disk', 'tension_strip', 'beam']),
        fringeOrder: MeasuredValue,
        stressLikeNPerMm: z.number().openapi({ description: 'q = fσ·N: 8P/(πD) disk, P/w strip, 6M/h² beam.' }),
        calibration: CalibrationSchema,
        exactInputs: z.array(z.string()),
      }),
    ),
    fit: FitSchema.nullable(),
    notes: z.array(z.string()),
  })
  .openapi('FringeValueCalcResult', {
    example: {
      wavelengthNm: 577,
      basis: 'single_specimen',
      defined: true,
      fringeValueNPerMm: { value: 11.1119, uncertainty: 0.0688 },
      points: [
        {
          specimen: 'disk',
          fringeOrder: { value: 5.5, uncertainty: 0.02 },
          stressLikeNPerMm: 61.1155,
          calibration: { defined: true, fringeValueNPerMm: { value: 11.1119, uncertainty: 0.0688 }, wavelengthNm: 577, formula: 'disk centre: fσ = 8P/(πDN)' },
          exactInputs: [],
        },
      ],
      fit: null,
      notes: ['disk centre: fσ = 8P/(πDN)'],
    },
  });
