import { z } from 'zod';
import { instant, label } from './common.ts';
import { GEOMETRY_KINDS, SITE_KINDS } from './models.ts';

/** Stages at which a reading is a residual (under_load is a test reading, not a residual). */
export const TREND_STAGES = ['before_load', 'inspection', 'after_unload', 'before_anneal', 'after_anneal'] as const;
export type TrendStage = (typeof TREND_STAGES)[number];

export const TREND_DIMENSIONS = ['batch', 'material', 'geometryKind', 'machiningMethod', 'operator', 'siteKind', 'week', 'month'] as const;
export type TrendDimension = (typeof TREND_DIMENSIONS)[number];

/** Acceptance limit used when the query gives none: 0.2 fringe is common practice, not a standard. */
export const DEFAULT_LIMIT_ORDER = 0.2;

const MAX_PERCENTILES = 9;

const booleanFlag = z.enum(['true', 'false']).default('false').transform((v) => v === 'true');

/** What every trend query can be narrowed by; batch and material by their lab-unique code and name. */
export const TrendFilterFields = {
  stage: z.enum(TREND_STAGES).default('before_load'),
  batch: label(120).optional(),
  material: label(200).optional(),
  geometryKind: z.enum(GEOMETRY_KINDS).optional(),
  machiningMethod: label(120).optional(),
  operator: label(100).optional(),
  siteKind: z.enum(SITE_KINDS).optional(),
  /** Observed at or after this instant. */
  from: instant.optional(),
  /** Observed before this instant. */
  to: instant.optional(),
};

export const TrendFilter = z.object(TrendFilterFields);
export type TrendFilter = z.infer<typeof TrendFilter>;

const limitOrder = z.coerce.number().positive().max(50).optional();

/** "0.9,0.95" → [0.9, 0.95]: each strictly between 0 and 1, at most nine, duplicates dropped. */
const percentileList = z
  .string()
  .max(200)
  .default('0.9,0.95')
  .transform((text, ctx) => {
    const values = text.split(',').map((part) => Number(part.trim()));
    if (values.some((p) => !Number.isFinite(p) || p <= 0 || p >= 1)) {
      ctx.addIssue({ code: 'custom', message: 'each percentile is a number strictly between 0 and 1, e.g. p=0.9,0.95' });
      return z.NEVER;
    }
    const distinct = [...new Set(values)].sort((a, b) => a - b);
    if (distinct.length > MAX_PERCENTILES) {
      ctx.addIssue({ code: 'custom', message: `at most ${MAX_PERCENTILES} percentiles` });
      return z.NEVER;
    }
    return distinct;
  });

export const ResidualTrendQuery = z.object({
  ...TrendFilterFields,
  groupBy: z.enum(TREND_DIMENSIONS).default('batch'),
  p: percentileList,
  limitOrder,
  format: z.enum(['json', 'csv']).default('json'),
});
export type ResidualTrendQuery = z.infer<typeof ResidualTrendQuery>;

export const TREND_MEASURES = ['fringeOrder', 'stress'] as const;
export type TrendMeasure = (typeof TREND_MEASURES)[number];

export const ControlChartQuery = z
  .object({
    ...TrendFilterFields,
    modelId: z.uuid().optional(),
    orderBy: z.enum(['machining', 'reading']).default('machining'),
    measure: z.enum(TREND_MEASURES).default('fringeOrder'),
    twoOfThree: booleanFlag,
  })
  .superRefine((q, ctx) => {
    if ((q.modelId === undefined) === (q.batch === undefined)) {
      ctx.addIssue({ code: 'custom', path: ['modelId'], message: 'give exactly one of modelId (a model\'s readings) or batch (one point per model)' });
    }
  });
export type ControlChartQuery = z.infer<typeof ControlChartQuery>;

export const CompareQuery = z
  .object({
    ...TrendFilterFields,
    by: z.enum(TREND_DIMENSIONS),
    a: label(200),
    b: label(200),
    unit: z.enum(['model', 'reading']).default('model'),
    measure: z.enum(TREND_MEASURES).default('fringeOrder'),
    confidence: z.coerce.number().min(0.5).max(0.999).default(0.95),
  })
  .superRefine((q, ctx) => {
    if (q.a === q.b) ctx.addIssue({ code: 'custom', path: ['b'], message: 'the two groups must differ' });
  });
export type CompareQuery = z.infer<typeof CompareQuery>;

// The site choice below replaces the siteKind filter.
const { siteKind: _siteKind, ...edgeFilterFields } = TrendFilterFields;

export const EdgeAgingQuery = z.object({
  ...edgeFilterFields,
  stage: z.enum(TREND_STAGES).default('inspection'),
  sites: z.enum(['machined_edge', 'free_edge']).default('machined_edge'),
  limitOrder,
  /** The instant the per-model forecasts are given for; now by default. */
  at: instant.optional(),
  forecastLimit: z.coerce.number().int().min(1).max(1000).default(100),
});
export type EdgeAgingQuery = z.infer<typeof EdgeAgingQuery>;
