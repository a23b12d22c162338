import { sql } from 'drizzle-orm';
import { type AnyPgColumn, check, doublePrecision, foreignKey, index, integer, jsonb, pgTable, primaryKey, text, timestamp, unique, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { materialFamily } from './enums.ts';
import { labs } from './labs.ts';
import { models } from './models.ts';

// Every table here is a record: a trigger (migration annealing_records_are_immutable) refuses
// UPDATE and DELETE; corrections are new rows with supersedes_id and a reason.
const at = (name: string) => timestamp(name, { withTimezone: true, precision: 3 });
// Below -50 °C or above 1600 °C no oven of this trade runs; such a value is a unit or typing error.
const PHYSICAL_C = (column: AnyPgColumn) => sql`${column} between -50 and 1600`;

/**
 * Annealing guidance: published entries (lab_id null, one row per catalogue version, shared and
 * read-only) and a lab's own entries in the same JSON shape.
 */
export const annealingGuidanceEntries = pgTable(
  'annealing_guidance_entries',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    labId: uuid('lab_id').references(() => labs.id),
    key: text('key').notNull(),
    title: text('title').notNull(),
    materialFamily: materialFamily('material_family').notNull(),
    catalogueVersion: text('catalogue_version'),
    /** Order in the published catalogue; the lowest per family is the family's default. */
    cataloguePosition: integer('catalogue_position'),
    entry: jsonb('entry').$type<Record<string, unknown>>().notNull(),
    supersedesId: uuid('supersedes_id').references((): AnyPgColumn => annealingGuidanceEntries.id),
    amendmentReason: text('amendment_reason'),
    createdAt: at('created_at').notNull().defaultNow(),
    recordedByKeyId: uuid('recorded_by_key_id'),
  },
  (t) => [
    uniqueIndex('annealing_guidance_published_unique').on(t.key, t.catalogueVersion).where(sql`${t.labId} is null`),
    uniqueIndex('annealing_guidance_lab_current_unique').on(t.labId, t.key).where(sql`${t.labId} is not null and ${t.supersedesId} is null`),
    uniqueIndex('annealing_guidance_one_successor').on(t.supersedesId),
    index('annealing_guidance_family_idx').on(t.materialFamily, t.labId),
    check('annealing_guidance_published_has_version', sql`(${t.labId} is null) = (${t.catalogueVersion} is not null) and (${t.labId} is null) = (${t.cataloguePosition} is not null)`),
    check('annealing_guidance_published_not_amended', sql`${t.labId} is not null or ${t.supersedesId} is null`),
    check('annealing_guidance_key_form', sql`${t.key} ~ '^[a-z0-9]+(-[a-z0-9]+)*([.][a-z0-9]+(-[a-z0-9]+)*)+$'`),
    check('annealing_guidance_title_not_blank', sql`length(trim(${t.title})) > 0`),
    check('annealing_guidance_entry_matches', sql`jsonb_typeof(${t.entry}) = 'object' and ${t.entry}->>'key' = ${t.key} and ${t.entry}->>'title' = ${t.title}`),
    check('annealing_guidance_amendment_has_reason', sql`(${t.supersedesId} is null) = (${t.amendmentReason} is null)`),
  ],
);

/** Append-only marks: the newest row for a lab and family is its house cycle. */
export const annealingHouseCycles = pgTable(
  'annealing_house_cycles',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    labId: uuid('lab_id').notNull().references(() => labs.id),
    materialFamily: materialFamily('material_family').notNull(),
    guidanceEntryId: uuid('guidance_entry_id').notNull().references(() => annealingGuidanceEntries.id),
    reason: text('reason'),
    /** Orders marks made in one transaction, where created_at (the transaction's time) ties. */
    markNumber: integer('mark_number').notNull().generatedAlwaysAsIdentity(),
    createdAt: at('created_at').notNull().defaultNow(),
    recordedByKeyId: uuid('recorded_by_key_id'),
  },
  (t) => [index('annealing_house_cycles_scope_idx').on(t.labId, t.materialFamily, t.markNumber)],
);

/** A generated plan for one model, kept whole as JSON with the guidance it came from. */
export const annealingPlans = pgTable(
  'annealing_plans',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    labId: uuid('lab_id').notNull().references(() => labs.id),
    modelId: uuid('model_id').notNull(),
    guidanceEntryId: uuid('guidance_entry_id').notNull().references(() => annealingGuidanceEntries.id),
    guidanceKey: text('guidance_key').notNull(),
    catalogueVersion: text('catalogue_version'),
    chosenBy: text('chosen_by').notNull(),
    maxSectionThicknessMm: doublePrecision('max_section_thickness_mm').notNull(),
    thicknessSource: text('thickness_source').notNull(),
    startTemperatureC: doublePrecision('start_temperature_c').notNull(),
    ovenLimits: jsonb('oven_limits').$type<Record<string, number>>().notNull().default({}),
    plan: jsonb('plan').$type<Record<string, unknown>>().notNull(),
    totalDurationH: doublePrecision('total_duration_h').notNull(),
    maxTemperatureC: doublePrecision('max_temperature_c').notNull(),
    supersedesId: uuid('supersedes_id').references((): AnyPgColumn => annealingPlans.id),
    amendmentReason: text('amendment_reason'),
    createdAt: at('created_at').notNull().defaultNow(),
    recordedByKeyId: uuid('recorded_by_key_id'),
  },
  (t) => [
    unique('annealing_plans_lab_id_unique').on(t.labId, t.id),
    foreignKey({ name: 'annealing_plans_model_same_lab_fk', columns: [t.labId, t.modelId], foreignColumns: [models.labId, models.id] }),
    uniqueIndex('annealing_plans_one_successor').on(t.supersedesId),
    index('annealing_plans_model_idx').on(t.modelId, t.createdAt),
    check('annealing_plans_chosen_by', sql`${t.chosenBy} in ('requested', 'house_cycle', 'published_default')`),
    check('annealing_plans_thickness_source', sql`${t.thicknessSource} in ('model', 'given')`),
    check('annealing_plans_thickness_range', sql`${t.maxSectionThicknessMm} > 0 and ${t.maxSectionThicknessMm} <= 300`),
    check('annealing_plans_start_range', sql`${t.startTemperatureC} between -40 and 60`),
    check('annealing_plans_duration_range', sql`${t.totalDurationH} > 0 and ${t.totalDurationH} < 10000`),
    check('annealing_plans_max_temperature_range', PHYSICAL_C(t.maxTemperatureC)),
    check('annealing_plans_plan_object', sql`jsonb_typeof(${t.plan}) = 'object' and jsonb_typeof(${t.plan}->'segments') = 'array'`),
    check('annealing_plans_ramp_rates_positive', sql`not jsonb_path_exists(${t.plan}, '$.segments[*] ? (@.kind == "ramp" && !(@.rateCPerH > 0))')`),
    check('annealing_plans_segments_physical', sql`not jsonb_path_exists(${t.plan}, '$.segments[*] ? (@.startTemperatureC < -50 || @.startTemperatureC > 1600 || @.endTemperatureC < -50 || @.endTemperatureC > 1600 || @.durationH < 0 || @.startH < 0)')`),
    check('annealing_plans_amendment_has_reason', sql`(${t.supersedesId} is null) = (${t.amendmentReason} is null)`),
  ],
);

/** An oven run: which plan, which oven, who, when; the load is in annealing_run_models. */
export const annealingRuns = pgTable(
  'annealing_runs',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    labId: uuid('lab_id').notNull().references(() => labs.id),
    planId: uuid('plan_id').notNull(),
    ovenName: text('oven_name').notNull(),
    operator: text('operator').notNull(),
    startedAt: at('started_at').notNull(),
    notes: text('notes'),
    supersedesId: uuid('supersedes_id').references((): AnyPgColumn => annealingRuns.id),
    amendmentReason: text('amendment_reason'),
    createdAt: at('created_at').notNull().defaultNow(),
    recordedByKeyId: uuid('recorded_by_key_id'),
  },
  (t) => [
    unique('annealing_runs_lab_id_unique').on(t.labId, t.id),
    foreignKey({ name: 'annealing_runs_plan_same_lab_fk', columns: [t.labId, t.planId], foreignColumns: [annealingPlans.labId, annealingPlans.id] }),
    uniqueIndex('annealing_runs_one_successor').on(t.supersedesId),
    index('annealing_runs_lab_started_idx').on(t.labId, t.startedAt, t.id),
    check('annealing_runs_oven_not_blank', sql`length(trim(${t.ovenName})) > 0`),
    check('annealing_runs_operator_not_blank', sql`length(trim(${t.operator})) > 0`),
    check('annealing_runs_amendment_has_reason', sql`(${t.supersedesId} is null) = (${t.amendmentReason} is null)`),
  ],
);

export const annealingRunModels = pgTable(
  'annealing_run_models',
  {
    labId: uuid('lab_id').notNull().references(() => labs.id),
    runId: uuid('run_id').notNull(),
    modelId: uuid('model_id').notNull(),
  },
  (t) => [
    primaryKey({ name: 'annealing_run_models_pk', columns: [t.runId, t.modelId] }),
    foreignKey({ name: 'annealing_run_models_run_same_lab_fk', columns: [t.labId, t.runId], foreignColumns: [annealingRuns.labId, annealingRuns.id] }),
    foreignKey({ name: 'annealing_run_models_model_same_lab_fk', columns: [t.labId, t.modelId], foreignColumns: [models.labId, models.id] }),
    index('annealing_run_models_model_idx').on(t.modelId),
  ],
);

/** An imported oven log with its comparison against the run's plan (arrays of samples left out). */
export const ovenLogs = pgTable(
  'oven_logs',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    labId: uuid('lab_id').notNull().references(() => labs.id),
    runId: uuid('run_id').notNull(),
    timeColumn: text('time_column').notNull(),
    sampleCount: integer('sample_count').notNull(),
    durationH: doublePrecision('duration_h').notNull(),
    minTemperatureC: doublePrecision('min_temperature_c').notNull(),
    maxTemperatureC: doublePrecision('max_temperature_c').notNull(),
    verdict: text('verdict').notNull(),
    comparison: jsonb('comparison').$type<Record<string, unknown>>().notNull(),
    bodySha256: text('body_sha256').notNull(),
    supersedesId: uuid('supersedes_id').references((): AnyPgColumn => ovenLogs.id),
    amendmentReason: text('amendment_reason'),
    importedAt: at('imported_at').notNull().defaultNow(),
    importedByKeyId: uuid('imported_by_key_id'),
  },
  (t) => [
    unique('oven_logs_lab_id_unique').on(t.labId, t.id),
    foreignKey({ name: 'oven_logs_run_same_lab_fk', columns: [t.labId, t.runId], foreignColumns: [annealingRuns.labId, annealingRuns.id] }),
    uniqueIndex('oven_logs_one_successor').on(t.supersedesId),
    index('oven_logs_run_idx').on(t.runId, t.importedAt),
    check('oven_logs_time_column', sql`${t.timeColumn} in ('elapsed_h', 'elapsed_min', 'timestamp')`),
    check('oven_logs_sample_count', sql`${t.sampleCount} >= 2`),
    check('oven_logs_duration_range', sql`${t.durationH} >= 0 and ${t.durationH} < 10000`),
    check('oven_logs_temperature_range', sql`${PHYSICAL_C(t.minTemperatureC)} and ${PHYSICAL_C(t.maxTemperatureC)} and ${t.minTemperatureC} <= ${t.maxTemperatureC}`),
    check('oven_logs_verdict', sql`${t.verdict} in ('pass', 'pass_with_remarks', 'fail')`),
    check('oven_logs_digest_is_sha256_hex', sql`${t.bodySha256} ~ '^[0-9a-f]{64}$'`),
    check('oven_logs_amendment_has_reason', sql`(${t.supersedesId} is null) = (${t.amendmentReason} is null)`),
  ],
);

/** The samples of a log in file order; elapsed time is non-decreasing per log (statement trigger). */
export const ovenLogSamples = pgTable(
  'oven_log_samples',
  {
    labId: uuid('lab_id').notNull().references(() => labs.id),
    logId: uuid('log_id').notNull(),
    seq: integer('seq').notNull(),
    elapsedH: doublePrecision('elapsed_h').notNull(),
    observedAt: at('observed_at'),
    temperatureC: doublePrecision('temperature_c').notNull(),
  },
  (t) => [
    primaryKey({ name: 'oven_log_samples_pk', columns: [t.logId, t.seq] }),
    foreignKey({ name: 'oven_log_samples_log_same_lab_fk', columns: [t.labId, t.logId], foreignColumns: [ovenLogs.labId, ovenLogs.id] }),
    check('oven_log_samples_seq_range', sql`${t.seq} >= 0`),
    check('oven_log_samples_elapsed_range', sql`${t.elapsedH} >= 0 and ${t.elapsedH} < 10000`),
    check('oven_log_samples_temperature_range', PHYSICAL_C(t.temperatureC)),
  ],
);
