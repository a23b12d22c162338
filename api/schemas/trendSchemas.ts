import { z } from '@hono/zod-openapi';
import { CompareQuery, ControlChartQuery, EdgeAgingQuery, ResidualTrendQuery } from '../../db/inputs/trends.ts';

// Queries as documented; examples are from the project's own invented demo lab.
export const ResidualTrendQuerySchema = ResidualTrendQuery.openapi({
  example: { stage: 'before_load', groupBy: 'batch', p: '0.9,0.95', limitOrder: 0.2, format: 'json', material: 'Polycarbonate sheet (catalogue)' },
});
export const ControlChartQuerySchema = ControlChartQuery.openapi({
  example: { stage: 'before_load', batch: 'PC-2026-07', orderBy: 'machining', measure: 'fringeOrder', twoOfThree: false },
});
export const CompareQuerySchema = CompareQuery.openapi({
  example: { stage: 'before_load', by: 'batch', a: 'PC-2026-07', b: 'PC-2026-09', unit: 'model', measure: 'fringeOrder', confidence: 0.95 },
});
export const EdgeAgingQuerySchema = EdgeAgingQuery.openapi({
  example: { stage: 'inspection', sites: 'machined_edge', batch: 'PC-2026-07', limitOrder: 0.2, forecastLimit: 100 },
});

const nullableNumber = z.number().nullable();

const Distribution = z
  .object({
    mean: nullableNumber,
    standardDeviation: nullableNumber.openapi({ description: 'Sample standard deviation (n − 1); null below two readings.' }),
    median: nullableNumber,
    percentiles: z.array(z.object({ p: z.number(), value: nullableNumber })),
  })
  .openapi('TrendDistribution');

const GroupSummary = z
  .object({
    key: z.string().nullable(),
    readingCount: z.number().int(),
    modelCount: z.number().int(),
    fringeOrder577: Distribution,
    stressMPa: Distribution,
    overLimit: z.object({ readings: z.number().int(), readingShare: nullableNumber, models: z.number().int(), modelShare: nullableNumber }),
    firstObservedAt: z.string().nullable(),
    lastObservedAt: z.string().nullable(),
  })
  .openapi('ResidualGroupSummary');

const limitSchema = z.object({ fringeOrder: z.number(), source: z.string(), rule: z.string().optional() });
const counted = { readingCount: z.number().int(), modelCount: z.number().int(), notes: z.array(z.string()) };
const summaryExample = { key: 'PC-2026-07', readingCount: 12, modelCount: 3, fringeOrder577: { mean: 0.081, standardDeviation: 0.021, median: 0.078, percentiles: [{ p: 0.9, value: 0.11 }] }, stressMPa: { mean: 0.095, standardDeviation: 0.025, median: 0.091, percentiles: [{ p: 0.9, value: 0.13 }] }, overLimit: { readings: 0, readingShare: 0, models: 0, modelShare: 0 }, firstObservedAt: '2026-11-02T09:00:00.000Z', lastObservedAt: '2026-11-20T16:30:00.000Z' };

export const ResidualTrendSchema = z
  .object({
    stage: z.string(),
    groupBy: z.string(),
    filters: z.record(z.string(), z.unknown()),
    percentilesRequested: z.array(z.number()),
    referenceWavelengthNm: z.number(),
    limit: limitSchema,
    total: GroupSummary,
    groups: z.array(GroupSummary),
    ...counted,
  })
  .openapi('ResidualTrend', {
    example: { stage: 'before_load', groupBy: 'batch', filters: {}, percentilesRequested: [0.9], referenceWavelengthNm: 577, limit: { fringeOrder: 0.2, source: 'default 0.2 fringe, common practice (not a standard)' }, readingCount: 12, modelCount: 3, total: { ...summaryExample, key: null }, groups: [summaryExample], notes: ['Fringe orders are reduced to 577 nm as retardation_nm / 577 …'] },
  });

export const ControlChartSchema = z
  .object({
    series: z.enum(['model', 'batch']),
    stage: z.string(),
    measure: z.string(),
    unit: z.string(),
    axis: z.string(),
    modelsWithoutMachiningTime: z.number().int(),
    chart: z.looseObject({ defined: z.boolean() }).openapi({ description: 'individualsMovingRangeChart: centre line, limits, moving ranges, run-rule flags per point; or { defined: false, reason }.' }),
    ...counted,
  })
  .openapi('TrendControlChart');

const CompareSide = z.object({ key: z.string(), n: z.number().int(), readingCount: z.number().int(), modelCount: z.number().int(), values: z.array(z.number()).optional() });

export const CompareSchema = z
  .object({
    by: z.string(),
    unit: z.string(),
    measure: z.string(),
    valueUnit: z.string(),
    stage: z.string(),
    confidence: z.number(),
    filters: z.record(z.string(), z.unknown()),
    a: CompareSide,
    b: CompareSide,
    comparison: z.looseObject({ decided: z.boolean() }).openapi({ description: 'compareGroups: Welch t interval for mean(a) − mean(b) and Mann–Whitney U; { decided: false, reason } below three values a side.' }),
    warnings: z.array(z.string()),
    ...counted,
  })
  .openapi('TrendComparison');

export const EdgeAgingSchema = z
  .object({
    stage: z.string(),
    sites: z.string(),
    filters: z.record(z.string(), z.unknown()),
    at: z.string(),
    limit: limitSchema,
    unit: z.string(),
    pointCount: z.number().int(),
    readingsWithoutMachining: z.number().int(),
    fit: z.looseObject({ defined: z.boolean() }).openapi({ description: 'fitEdgeAging: √t and linear fits, AIC choice, limit-crossing forecast; or { defined: false, reason }.' }),
    storedModelCount: z.number().int(),
    storedModels: z.array(z.looseObject({ modelCode: z.string(), status: z.enum(['over_limit', 'past_forecast', 'forecast', 'no_forecast']), testBeforeAt: z.string().nullable() })),
    warnings: z.array(z.string()),
    ...counted,
  })
  .openapi('EdgeAging');
