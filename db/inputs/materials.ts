import { z } from 'zod';
import { label } from './common.ts';

export const MATERIAL_FAMILIES = ['polycarbonate', 'anhydride_cured_epoxy', 'cast_acrylic', 'allyl_diglycol_carbonate', 'polyurethane_rubber', 'soda_lime_glass', 'other'] as const;

const SourceEntry = z.object({
  document: label(300),
  locator: z.string().trim().max(300).optional(),
  flag: z.enum(['read', 'from_memory', 'common_practice', 'derived', 'measured']),
});

export const CreateMaterialInput = z
  .object({
    name: label(),
    family: z.enum(MATERIAL_FAMILIES),
    fringeValueNPerMm: z.number().positive().lt(10000),
    fringeValueUncertaintyNPerMm: z.number().min(0),
    fringeValueWavelengthNm: z.number().min(380).max(780),
    elasticModulusGPa: z.number().positive().lt(1000).optional(),
    poissonRatio: z.number().positive().max(0.5).optional(),
    glassTransitionC: z.number().min(-150).max(1500).optional(),
    thermalExpansionPerMK: z.number().positive().lt(1000).optional(),
    thermalConductivityWPerMK: z.number().positive().lt(100).optional(),
    densityKgPerM3: z.number().gt(100).lt(20000).optional(),
    specificHeatJPerKgK: z.number().gt(10).lt(10000).optional(),
    thermalDiffusivityMm2PerS: z.number().positive().lt(100).optional(),
    sources: z.record(z.string().max(80), SourceEntry).default({}),
  })
  .strict()
  .refine((m) => m.fringeValueUncertaintyNPerMm < m.fringeValueNPerMm, {
    path: ['fringeValueUncertaintyNPerMm'],
    message: 'must be smaller than the fringe value itself',
  });
export type CreateMaterialInput = z.infer<typeof CreateMaterialInput>;

export const CreateBatchInput = z
  .object({
    materialId: z.uuid(),
    code: label(60),
    kind: z.enum(['cast_batch', 'sheet_lot']),
    supplierLot: z.string().trim().max(120).optional(),
    madeOn: z.iso.datetime({ offset: true }).optional(),
    notes: z.string().trim().max(2000).optional(),
  })
  .strict();
export type CreateBatchInput = z.infer<typeof CreateBatchInput>;
