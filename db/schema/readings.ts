import { sql } from 'drizzle-orm';
import { type AnyPgColumn, check, doublePrecision, foreignKey, index, jsonb, pgTable, text, timestamp, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { labs } from './labs.ts';
import { sites } from './models.ts';
import { readingMethod, readingSign, readingStage } from './enums.ts';

export const readingImports = pgTable(
  'reading_imports',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    labId: uuid('lab_id').notNull().references(() => labs.id),
    format: text('format').notNull(),
    rowCount: doublePrecision('row_count').notNull(),
    idempotencyKey: text('idempotency_key'),
    /** SHA-256 of the request body, so a replayed Idempotency-Key with another body is refused. */
    bodySha256: text('body_sha256'),
    importedAt: timestamp('imported_at', { withTimezone: true, precision: 3 }).notNull().defaultNow(),
    importedByKeyId: uuid('imported_by_key_id'),
  },
  (t) => [
    uniqueIndex('reading_imports_idempotency_unique').on(t.labId, t.idempotencyKey),
    check('reading_imports_format', sql`${t.format} in ('csv', 'json')`),
  ],
);

/**
 * Fringe readings are original observations: a trigger (migration 0001) refuses UPDATE and
 * DELETE. A correction is a new row whose supersedes_id names the reading it replaces.
 */
export const readings = pgTable(
  'readings',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    labId: uuid('lab_id').notNull().references(() => labs.id),
    siteId: uuid('site_id').notNull(),
    stage: readingStage('stage').notNull(),
    loadN: doublePrecision('load_n'),
    observedAt: timestamp('observed_at', { withTimezone: true, precision: 3 }).notNull(),
    operator: text('operator').notNull(),
    wavelengthNm: doublePrecision('wavelength_nm'),
    method: readingMethod('method').notNull(),
    rawInputs: jsonb('raw_inputs').$type<Record<string, unknown>>().notNull(),
    sign: readingSign('sign').notNull(),
    fringeOrder: doublePrecision('fringe_order').notNull(),
    fringeOrderUncertainty: doublePrecision('fringe_order_uncertainty').notNull(),
    retardationNm: doublePrecision('retardation_nm').notNull(),
    notes: text('notes'),
    supersedesId: uuid('supersedes_id').references((): AnyPgColumn => readings.id),
    amendmentReason: text('amendment_reason'),
    importId: uuid('import_id').references(() => readingImports.id),
    recordedAt: timestamp('recorded_at', { withTimezone: true, precision: 3 }).notNull().defaultNow(),
    recordedByKeyId: uuid('recorded_by_key_id'),
  },
  (t) => [
    foreignKey({ name: 'readings_site_same_lab_fk', columns: [t.labId, t.siteId], foreignColumns: [sites.labId, sites.id] }),
    uniqueIndex('readings_one_successor').on(t.supersedesId),
    index('readings_site_stage_idx').on(t.siteId, t.stage, t.observedAt),
    index('readings_lab_recorded_idx').on(t.labId, t.recordedAt, t.id),
    // Trend queries select one stage of a lab, often within a date range.
    index('readings_lab_stage_observed_idx').on(t.labId, t.stage, t.observedAt),
    check('readings_operator_not_blank', sql`length(trim(${t.operator})) > 0`),
    check('readings_load_only_under_load', sql`(${t.stage} = 'under_load') = (${t.loadN} is not null)`),
    check('readings_load_range', sql`${t.loadN} is null or (${t.loadN} > 0 and ${t.loadN} < 1e7)`),
    check('readings_wavelength_visible', sql`${t.wavelengthNm} is null or ${t.wavelengthNm} between 380 and 780`),
    check('readings_fringe_order_range', sql`${t.fringeOrder} >= 0 and ${t.fringeOrder} <= 200`),
    check('readings_uncertainty_range', sql`${t.fringeOrderUncertainty} >= 0 and ${t.fringeOrderUncertainty} <= 10`),
    check('readings_retardation_range', sql`${t.retardationNm} >= 0`),
    check('readings_amendment_has_reason', sql`(${t.supersedesId} is null) = (${t.amendmentReason} is null)`),
    check('readings_amendment_reason_not_blank', sql`${t.amendmentReason} is null or length(trim(${t.amendmentReason})) > 0`),
    check('readings_raw_inputs_object', sql`jsonb_typeof(${t.rawInputs}) = 'object'`),
  ],
);
