import { sql } from 'drizzle-orm';
import { check, doublePrecision, foreignKey, index, jsonb, pgTable, text, timestamp, unique, uuid } from 'drizzle-orm/pg-core';
import { labs } from './labs.ts';
import { batchKind, materialFamily } from './enums.ts';

/** Where each property value comes from: document, locator and how it was obtained. */
export type PropertySources = Record<string, { document: string; locator?: string; flag: 'read' | 'from_memory' | 'common_practice' | 'derived' | 'measured' }>;

export const materials = pgTable(
  'materials',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    labId: uuid('lab_id').notNull().references(() => labs.id),
    name: text('name').notNull(),
    family: materialFamily('family').notNull(),
    fringeValueNPerMm: doublePrecision('fringe_value_n_per_mm').notNull(),
    fringeValueUncertaintyNPerMm: doublePrecision('fringe_value_uncertainty_n_per_mm').notNull(),
    fringeValueWavelengthNm: doublePrecision('fringe_value_wavelength_nm').notNull(),
    elasticModulusGPa: doublePrecision('elastic_modulus_gpa'),
    poissonRatio: doublePrecision('poisson_ratio'),
    glassTransitionC: doublePrecision('glass_transition_c'),
    thermalExpansionPerMK: doublePrecision('thermal_expansion_per_mk'),
    thermalConductivityWPerMK: doublePrecision('thermal_conductivity_w_per_mk'),
    densityKgPerM3: doublePrecision('density_kg_per_m3'),
    specificHeatJPerKgK: doublePrecision('specific_heat_j_per_kg_k'),
    thermalDiffusivityMm2PerS: doublePrecision('thermal_diffusivity_mm2_per_s'),
    sources: jsonb('sources').$type<PropertySources>().notNull().default({}),
    createdAt: timestamp('created_at', { withTimezone: true, precision: 3 }).notNull().defaultNow(),
  },
  (t) => [
    unique('materials_lab_name_unique').on(t.labId, t.name),
    unique('materials_lab_id_unique').on(t.labId, t.id),
    check('materials_name_not_blank', sql`length(trim(${t.name})) > 0`),
    check('materials_fringe_value_positive', sql`${t.fringeValueNPerMm} > 0 and ${t.fringeValueNPerMm} < 10000`),
    check('materials_fringe_value_uncertainty', sql`${t.fringeValueUncertaintyNPerMm} >= 0 and ${t.fringeValueUncertaintyNPerMm} < ${t.fringeValueNPerMm}`),
    check('materials_wavelength_visible', sql`${t.fringeValueWavelengthNm} between 380 and 780`),
    check('materials_modulus_range', sql`${t.elasticModulusGPa} is null or (${t.elasticModulusGPa} > 0 and ${t.elasticModulusGPa} < 1000)`),
    check('materials_poisson_range', sql`${t.poissonRatio} is null or (${t.poissonRatio} > 0 and ${t.poissonRatio} <= 0.5)`),
    check('materials_tg_range', sql`${t.glassTransitionC} is null or ${t.glassTransitionC} between -150 and 1500`),
    check('materials_cte_range', sql`${t.thermalExpansionPerMK} is null or (${t.thermalExpansionPerMK} > 0 and ${t.thermalExpansionPerMK} < 1000)`),
    check('materials_conductivity_range', sql`${t.thermalConductivityWPerMK} is null or (${t.thermalConductivityWPerMK} > 0 and ${t.thermalConductivityWPerMK} < 100)`),
    check('materials_density_range', sql`${t.densityKgPerM3} is null or (${t.densityKgPerM3} > 100 and ${t.densityKgPerM3} < 20000)`),
    check('materials_heat_capacity_range', sql`${t.specificHeatJPerKgK} is null or (${t.specificHeatJPerKgK} > 10 and ${t.specificHeatJPerKgK} < 10000)`),
    check('materials_diffusivity_range', sql`${t.thermalDiffusivityMm2PerS} is null or (${t.thermalDiffusivityMm2PerS} > 0 and ${t.thermalDiffusivityMm2PerS} < 100)`),
  ],
);

export const batches = pgTable(
  'batches',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    labId: uuid('lab_id').notNull().references(() => labs.id),
    materialId: uuid('material_id').notNull(),
    code: text('code').notNull(),
    kind: batchKind('kind').notNull(),
    supplierLot: text('supplier_lot'),
    madeOn: timestamp('made_on', { withTimezone: true, precision: 3 }),
    notes: text('notes'),
    createdAt: timestamp('created_at', { withTimezone: true, precision: 3 }).notNull().defaultNow(),
  },
  (t) => [
    unique('batches_lab_code_unique').on(t.labId, t.code),
    unique('batches_lab_id_unique').on(t.labId, t.id),
    foreignKey({ name: 'batches_material_same_lab_fk', columns: [t.labId, t.materialId], foreignColumns: [materials.labId, materials.id] }),
    index('batches_material_idx').on(t.materialId),
    check('batches_code_not_blank', sql`length(trim(${t.code})) > 0`),
  ],
);
