import { sql } from 'drizzle-orm';
import { check, doublePrecision, foreignKey, index, jsonb, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { labs } from './labs.ts';
import { batches } from './materials.ts';
import { models } from './models.ts';
import { calibrationSpecimen } from './enums.ts';

/**
 * A batch's own fringe-value calibration: one specimen reading, its raw inputs, and the fringe
 * value derived from them. Immutable like readings (trigger in migration 0003).
 */
export const calibrations = pgTable(
  'calibrations',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    labId: uuid('lab_id').notNull().references(() => labs.id),
    batchId: uuid('batch_id').notNull(),
    specimen: calibrationSpecimen('specimen').notNull(),
    rawInputs: jsonb('raw_inputs').$type<Record<string, unknown>>().notNull(),
    wavelengthNm: doublePrecision('wavelength_nm').notNull(),
    fringeValueNPerMm: doublePrecision('fringe_value_n_per_mm').notNull(),
    fringeValueUncertaintyNPerMm: doublePrecision('fringe_value_uncertainty_n_per_mm').notNull(),
    observedAt: timestamp('observed_at', { withTimezone: true, precision: 3 }).notNull(),
    operator: text('operator').notNull(),
    notes: text('notes'),
    recordedAt: timestamp('recorded_at', { withTimezone: true, precision: 3 }).notNull().defaultNow(),
    recordedByKeyId: uuid('recorded_by_key_id'),
  },
  (t) => [
    foreignKey({ name: 'calibrations_batch_same_lab_fk', columns: [t.labId, t.batchId], foreignColumns: [batches.labId, batches.id] }),
    index('calibrations_batch_idx').on(t.batchId, t.observedAt),
    check('calibrations_wavelength_visible', sql`${t.wavelengthNm} between 380 and 780`),
    check('calibrations_fringe_value_range', sql`${t.fringeValueNPerMm} > 0 and ${t.fringeValueNPerMm} < 10000`),
    check('calibrations_uncertainty_range', sql`${t.fringeValueUncertaintyNPerMm} >= 0`),
    check('calibrations_operator_not_blank', sql`length(trim(${t.operator})) > 0`),
    check('calibrations_raw_inputs_object', sql`jsonb_typeof(${t.rawInputs}) = 'object'`),
  ],
);

/**
 * Acceptance limits for fitness to test, for a whole project or one model. Append-only: the
 * newest row for a scope is in force, earlier ones stay as the history of the lab's limits.
 */
export const acceptanceCriteria = pgTable(
  'acceptance_criteria',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    labId: uuid('lab_id').notNull().references(() => labs.id),
    project: text('project'),
    modelId: uuid('model_id'),
    maxResidualFringeOrder: doublePrecision('max_residual_fringe_order'),
    maxResidualStressMPa: doublePrecision('max_residual_stress_mpa'),
    maxResidualFractionOfTestOrder: doublePrecision('max_residual_fraction_of_test_order'),
    plannedLoadN: doublePrecision('planned_load_n'),
    coverageFactor: doublePrecision('coverage_factor').notNull().default(2),
    reason: text('reason'),
    createdAt: timestamp('created_at', { withTimezone: true, precision: 3 }).notNull().defaultNow(),
    recordedByKeyId: uuid('recorded_by_key_id'),
  },
  (t) => [
    foreignKey({ name: 'acceptance_criteria_model_same_lab_fk', columns: [t.labId, t.modelId], foreignColumns: [models.labId, models.id] }),
    index('acceptance_criteria_scope_idx').on(t.labId, t.modelId, t.project, t.createdAt),
    check('acceptance_criteria_one_scope', sql`(${t.project} is null) <> (${t.modelId} is null)`),
    check('acceptance_criteria_some_limit', sql`coalesce(${t.maxResidualFringeOrder}, ${t.maxResidualStressMPa}, ${t.maxResidualFractionOfTestOrder}) is not null`),
    check('acceptance_criteria_order_range', sql`${t.maxResidualFringeOrder} is null or (${t.maxResidualFringeOrder} > 0 and ${t.maxResidualFringeOrder} <= 50)`),
    check('acceptance_criteria_stress_range', sql`${t.maxResidualStressMPa} is null or (${t.maxResidualStressMPa} > 0 and ${t.maxResidualStressMPa} <= 1000)`),
    check('acceptance_criteria_fraction_range', sql`${t.maxResidualFractionOfTestOrder} is null or (${t.maxResidualFractionOfTestOrder} > 0 and ${t.maxResidualFractionOfTestOrder} <= 1)`),
    check('acceptance_criteria_load_range', sql`${t.plannedLoadN} is null or (${t.plannedLoadN} > 0 and ${t.plannedLoadN} < 1e7)`),
    check('acceptance_criteria_coverage_range', sql`${t.coverageFactor} >= 1 and ${t.coverageFactor} <= 3`),
  ],
);
