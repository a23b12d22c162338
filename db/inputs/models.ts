import { z } from 'zod';
import { instant, label } from './common.ts';

export const GEOMETRY_KINDS = ['opposite_rounded_notches', 'opposite_sharp_sawn_notches', 'sharp_notches_with_relief_notches', 'compact_tension', 'calibration_disk', 'tension_strip', 'bending_beam', 'other'] as const;
export const SITE_KINDS = ['notch_root', 'machined_edge', 'interior', 'calibration_point', 'other'] as const;
export const EVENT_KINDS = ['cast', 'cured', 'machined', 'polished', 'annealed', 'loaded', 'unloaded', 'stored', 'inspected'] as const;

const lengthMm = (max: number) => z.number().positive().max(max);

export const CreateModelInput = z
  .object({
    batchId: z.uuid(),
    code: label(60),
    geometryKind: z.enum(GEOMETRY_KINDS),
    thicknessMm: lengthMm(300),
    thicknessUncertaintyMm: z.number().min(0).max(10).default(0.02),
    grossWidthMm: lengthMm(2000).optional(),
    netWidthMm: lengthMm(2000).optional(),
    notchDepthMm: lengthMm(1000).optional(),
    notchRootRadiusMm: z.number().min(0).max(500).optional(),
    project: z.string().trim().max(120).optional(),
    notes: z.string().trim().max(2000).optional(),
  })
  .strict()
  .superRefine((m, ctx) => {
    if (m.thicknessUncertaintyMm >= m.thicknessMm) ctx.addIssue({ code: 'custom', path: ['thicknessUncertaintyMm'], message: 'must be smaller than the thickness' });
    if (m.netWidthMm !== undefined && m.grossWidthMm !== undefined && m.netWidthMm > m.grossWidthMm) ctx.addIssue({ code: 'custom', path: ['netWidthMm'], message: 'cannot exceed the gross width' });
    if (m.notchDepthMm !== undefined && m.grossWidthMm !== undefined && 2 * m.notchDepthMm >= m.grossWidthMm) ctx.addIssue({ code: 'custom', path: ['notchDepthMm'], message: 'two opposite notches must leave a ligament (2 × depth < gross width)' });
  });
export type CreateModelInput = z.infer<typeof CreateModelInput>;

export const CreateSiteInput = z
  .object({
    label: label(60),
    kind: z.enum(SITE_KINDS),
    onFreeEdge: z.boolean(),
    localThicknessMm: lengthMm(300).optional(),
    notes: z.string().trim().max(2000).optional(),
  })
  .strict();
export type CreateSiteInput = z.infer<typeof CreateSiteInput>;

export const CreateEventInput = z
  .object({
    kind: z.enum(EVENT_KINDS),
    occurredAt: instant,
    operator: label(100),
    machiningMethod: z.string().trim().min(1).max(80).optional(),
    tool: z.string().trim().max(120).optional(),
    temperatureC: z.number().min(-80).max(1600).optional(),
    relativeHumidityPct: z.number().min(0).max(100).optional(),
    loadN: z.number().min(0).lt(1e7).optional(),
    notes: z.string().trim().max(2000).optional(),
    details: z.record(z.string().max(80), z.union([z.string().max(500), z.number(), z.boolean()])).default({}),
  })
  .strict()
  .superRefine((e, ctx) => {
    if (e.kind === 'machined' && !e.machiningMethod) ctx.addIssue({ code: 'custom', path: ['machiningMethod'], message: 'a machining event names its method (e.g. milling, band saw, fly cutter)' });
  });
export type CreateEventInput = z.infer<typeof CreateEventInput>;
