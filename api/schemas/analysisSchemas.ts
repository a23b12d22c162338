import { z } from '@hono/zod-openapi';
import { createSelectSchema } from 'drizzle-zod';
import { CreateAcceptanceCriteriaInput, CreateCalibrationInput } from '../../db/inputs/analysis.ts';
import { acceptanceCriteria, calibrations } from '../../db/schema/index.ts';

const at = z.iso.datetime();
const measured = z.object({ value: z.number(), uncertainty: z.number() });

export const CalibrationRow = createSelectSchema(calibrations, { observedAt: at, recordedAt: at }).openapi('Calibration');
export const CalibrationCreated = CalibrationRow.extend({ formula: z.string() }).openapi('CalibrationCreated');
export const AcceptanceCriteriaRow = createSelectSchema(acceptanceCriteria, { createdAt: at }).openapi('AcceptanceCriteria');

export const CalibrationInputSchema = CreateCalibrationInput.openapi('CalibrationInput', {
  example: {
    specimen: 'disk',
    loadN: { value: 1200, uncertainty: 6 },
    diameterMm: { value: 50, uncertainty: 0.02 },
    fringeOrder: { value: 5.5, uncertainty: 0.02 },
    wavelengthNm: 577,
    observedAt: '2026-11-18T10:00:00Z',
    operator: 'M. Lindqvist',
  },
});

export const AcceptanceCriteriaInputSchema = CreateAcceptanceCriteriaInput.openapi('AcceptanceCriteriaInput', {
  example: { project: 'notch residual study', maxResidualFringeOrder: 0.15, maxResidualFractionOfTestOrder: 0.05, plannedLoadN: 600, reason: 'tighter limit for the fatigue series' },
});

const decision = z.enum(['conforming', 'needs_annealing', 'undecided', 'no_readings']);

const SiteAnalysis = z
  .object({
    siteId: z.uuid(),
    label: z.string(),
    kind: z.string(),
    onFreeEdge: z.boolean(),
    thicknessMm: measured,
    decision,
    readingIds: z.record(z.string(), z.string()).describe('the stored reading that fed each stage'),
    current: z.object({ readingId: z.uuid(), stage: z.string(), observedAt: at, order: measured, stress: z.object({ stressMPa: measured, kind: z.string() }) }).nullable(),
    analysis: z.looseObject({ stages: z.record(z.string(), z.unknown()), notes: z.array(z.string()) }).nullable().describe('fabrication residual, load-corrected order, permanent set, share, inelastic fraction, anneal relief, each with uncertainty and stress'),
    stressConcentration: z.object({ measured: z.unknown(), handbook: z.unknown() }),
    testFringeOrder: z.unknown(),
    fitness: z.unknown(),
    notes: z.array(z.string()),
  })
  .openapi('SiteResidualAnalysis');

export const ModelResidualAnalysis = z
  .object({
    model: z.object({ id: z.uuid(), code: z.string(), geometryKind: z.string(), thicknessMm: z.number(), batchId: z.uuid(), materialName: z.string() }),
    fringeValue: z.object({ fringeValueNPerMm: measured, wavelengthNm: z.number(), source: z.enum(['batch_calibration', 'catalogue']), calibrationCount: z.number(), method: z.string(), notes: z.array(z.string()) }),
    limits: z.object({ source: z.enum(['model', 'project', 'common_practice']), flag: z.string().nullable(), criteria: z.record(z.string(), z.number()), coverageFactor: z.number(), plannedLoadN: z.number().nullable(), criteriaId: z.uuid().nullable() }),
    decision,
    sites: z.array(SiteAnalysis),
    notes: z.array(z.string()),
  })
  .openapi('ModelResidualAnalysis');
