import { sql } from 'drizzle-orm';
import { boolean, check, doublePrecision, foreignKey, index, jsonb, pgTable, text, timestamp, unique, uuid } from 'drizzle-orm/pg-core';
import { labs } from './labs.ts';
import { batches } from './materials.ts';
import { eventKind, geometryKind, siteKind } from './enums.ts';

export const models = pgTable(
  'models',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    labId: uuid('lab_id').notNull().references(() => labs.id),
    batchId: uuid('batch_id').notNull(),
    code: text('code').notNull(),
    geometryKind: geometryKind('geometry_kind').notNull(),
    thicknessMm: doublePrecision('thickness_mm').notNull(),
    thicknessUncertaintyMm: doublePrecision('thickness_uncertainty_mm').notNull(),
    grossWidthMm: doublePrecision('gross_width_mm'),
    netWidthMm: doublePrecision('net_width_mm'),
    notchDepthMm: doublePrecision('notch_depth_mm'),
    notchRootRadiusMm: doublePrecision('notch_root_radius_mm'),
    project: text('project'),
    notes: text('notes'),
    createdAt: timestamp('created_at', { withTimezone: true, precision: 3 }).notNull().defaultNow(),
  },
  (t) => [
    unique('models_lab_code_unique').on(t.labId, t.code),
    unique('models_lab_id_unique').on(t.labId, t.id),
    foreignKey({ name: 'models_batch_same_lab_fk', columns: [t.labId, t.batchId], foreignColumns: [batches.labId, batches.id] }),
    index('models_batch_idx').on(t.batchId),
    check('models_code_not_blank', sql`length(trim(${t.code})) > 0`),
    check('models_thickness_range', sql`${t.thicknessMm} > 0 and ${t.thicknessMm} <= 300`),
    check('models_thickness_uncertainty', sql`${t.thicknessUncertaintyMm} >= 0 and ${t.thicknessUncertaintyMm} < ${t.thicknessMm}`),
    check('models_gross_width_range', sql`${t.grossWidthMm} is null or (${t.grossWidthMm} > 0 and ${t.grossWidthMm} <= 2000)`),
    check('models_net_width_range', sql`${t.netWidthMm} is null or (${t.netWidthMm} > 0 and (${t.grossWidthMm} is null or ${t.netWidthMm} <= ${t.grossWidthMm}))`),
    check('models_notch_depth_range', sql`${t.notchDepthMm} is null or (${t.notchDepthMm} > 0 and (${t.grossWidthMm} is null or 2 * ${t.notchDepthMm} < ${t.grossWidthMm}))`),
    check('models_notch_radius_range', sql`${t.notchRootRadiusMm} is null or (${t.notchRootRadiusMm} >= 0 and ${t.notchRootRadiusMm} <= 500)`),
  ],
);

export const sites = pgTable(
  'sites',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    labId: uuid('lab_id').notNull().references(() => labs.id),
    modelId: uuid('model_id').notNull(),
    label: text('label').notNull(),
    kind: siteKind('kind').notNull(),
    onFreeEdge: boolean('on_free_edge').notNull(),
    localThicknessMm: doublePrecision('local_thickness_mm'),
    notes: text('notes'),
    createdAt: timestamp('created_at', { withTimezone: true, precision: 3 }).notNull().defaultNow(),
  },
  (t) => [
    unique('sites_model_label_unique').on(t.modelId, t.label),
    unique('sites_lab_id_unique').on(t.labId, t.id),
    foreignKey({ name: 'sites_model_same_lab_fk', columns: [t.labId, t.modelId], foreignColumns: [models.labId, models.id] }),
    check('sites_label_not_blank', sql`length(trim(${t.label})) > 0`),
    check('sites_local_thickness_range', sql`${t.localThicknessMm} is null or (${t.localThicknessMm} > 0 and ${t.localThicknessMm} <= 300)`),
  ],
);

export const modelEvents = pgTable(
  'model_events',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    labId: uuid('lab_id').notNull().references(() => labs.id),
    modelId: uuid('model_id').notNull(),
    kind: eventKind('kind').notNull(),
    occurredAt: timestamp('occurred_at', { withTimezone: true, precision: 3 }).notNull(),
    operator: text('operator').notNull(),
    machiningMethod: text('machining_method'),
    tool: text('tool'),
    temperatureC: doublePrecision('temperature_c'),
    relativeHumidityPct: doublePrecision('relative_humidity_pct'),
    loadN: doublePrecision('load_n'),
    notes: text('notes'),
    details: jsonb('details').$type<Record<string, unknown>>().notNull().default({}),
    recordedAt: timestamp('recorded_at', { withTimezone: true, precision: 3 }).notNull().defaultNow(),
    recordedByKeyId: uuid('recorded_by_key_id'),
  },
  (t) => [
    foreignKey({ name: 'model_events_model_same_lab_fk', columns: [t.labId, t.modelId], foreignColumns: [models.labId, models.id] }),
    index('model_events_model_time_idx').on(t.modelId, t.occurredAt),
    // Trends look up machining windows per model; machining is a small share of all events.
    index('model_events_machined_idx').on(t.labId, t.modelId, t.occurredAt).where(sql`${t.kind} = 'machined'`),
    check('model_events_operator_not_blank', sql`length(trim(${t.operator})) > 0`),
    check('model_events_machining_needs_method', sql`${t.kind} <> 'machined' or ${t.machiningMethod} is not null`),
    check('model_events_temperature_range', sql`${t.temperatureC} is null or ${t.temperatureC} between -80 and 1600`),
    check('model_events_humidity_range', sql`${t.relativeHumidityPct} is null or ${t.relativeHumidityPct} between 0 and 100`),
    check('model_events_load_range', sql`${t.loadN} is null or (${t.loadN} >= 0 and ${t.loadN} < 1e7)`),
  ],
);
