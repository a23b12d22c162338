import { pgEnum } from 'drizzle-orm/pg-core';

export const keyRole = pgEnum('key_role', ['viewer', 'technician', 'admin']);

export const materialFamily = pgEnum('material_family', [
  'polycarbonate',
  'anhydride_cured_epoxy',
  'cast_acrylic',
  'allyl_diglycol_carbonate',
  'polyurethane_rubber',
  'soda_lime_glass',
  'other',
]);

export const batchKind = pgEnum('batch_kind', ['cast_batch', 'sheet_lot']);

export const geometryKind = pgEnum('geometry_kind', [
  'opposite_rounded_notches',
  'opposite_sharp_sawn_notches',
  'sharp_notches_with_relief_notches',
  'compact_tension',
  'calibration_disk',
  'tension_strip',
  'bending_beam',
  'other',
]);

export const siteKind = pgEnum('site_kind', ['notch_root', 'machined_edge', 'interior', 'calibration_point', 'other']);

export const eventKind = pgEnum('event_kind', [
  'cast',
  'cured',
  'machined',
  'polished',
  'annealed',
  'loaded',
  'unloaded',
  'stored',
  'inspected',
]);

export const readingStage = pgEnum('reading_stage', [
  'before_load',
  'under_load',
  'after_unload',
  'before_anneal',
  'after_anneal',
  'inspection',
]);

export const readingMethod = pgEnum('reading_method', [
  'whole_order',
  'tardy',
  'senarmont',
  'compensator',
  'direct',
  'white_light_colour',
]);

export const readingSign = pgEnum('reading_sign', ['positive', 'negative', 'unknown']);

export const calibrationSpecimen = pgEnum('calibration_specimen', ['disk', 'tension_strip', 'bending_beam']);
