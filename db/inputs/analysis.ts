import { z } from 'zod';
import { instant, label } from './common.ts';

const measured = (max: number, what: string) =>
  z.object({ value: z.number().positive().max(max), uncertainty: z.number().min(0).max(max).default(0) }).strict().describe(what);

const common = {
  fringeOrder: measured(200, 'fringe order at the calibration point, ± standard uncertainty'),
  wavelengthNm: z.number().min(380).max(780),
  observedAt: instant,
  operator: label(100),
  notes: z.string().trim().max(2000).optional(),
};

/** A calibration specimen of a batch, by kind, with the raw inputs its formula needs. */
export const CreateCalibrationInput = z.discriminatedUnion('specimen', [
  z.object({ specimen: z.literal('disk'), loadN: measured(1e6, 'diametral load, N'), diameterMm: measured(1000, 'disk diameter, mm'), ...common }).strict(),
  z.object({ specimen: z.literal('tension_strip'), loadN: measured(1e6, 'axial load, N'), widthMm: measured(1000, 'strip width, mm'), ...common }).strict(),
  z.object({ specimen: z.literal('bending_beam'), bendingMomentNmm: measured(1e9, 'moment on the whole section in the pure-bending span, N·mm'), depthMm: measured(1000, 'beam depth in the plane of bending, mm'), ...common }).strict(),
]);
export type CreateCalibrationInput = z.infer<typeof CreateCalibrationInput>;

export const CreateAcceptanceCriteriaInput = z
  .object({
    modelId: z.uuid().optional(),
    project: z.string().trim().min(1).max(120).optional(),
    maxResidualFringeOrder: z.number().positive().max(50).optional(),
    maxResidualStressMPa: z.number().positive().max(1000).optional(),
    maxResidualFractionOfTestOrder: z.number().positive().max(1).optional(),
    plannedLoadN: z.number().positive().lt(1e7).optional(),
    coverageFactor: z.number().min(1).max(3).default(2),
    reason: z.string().trim().max(500).optional(),
  })
  .strict()
  .superRefine((c, ctx) => {
    if ((c.modelId === undefined) === (c.project === undefined)) ctx.addIssue({ code: 'custom', path: ['modelId'], message: 'give exactly one scope: modelId or project' });
    if (c.maxResidualFringeOrder === undefined && c.maxResidualStressMPa === undefined && c.maxResidualFractionOfTestOrder === undefined) {
      ctx.addIssue({ code: 'custom', path: ['maxResidualFringeOrder'], message: 'give at least one limit' });
    }
  });
export type CreateAcceptanceCriteriaInput = z.infer<typeof CreateAcceptanceCriteriaInput>;
