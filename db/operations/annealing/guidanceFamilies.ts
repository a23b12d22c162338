import type { MaterialFamily as GuidanceFamily } from '../../../src/annealing/AnnealingGuidance.ts';
import type { MATERIAL_FAMILIES } from '../../inputs/materials.ts';

export type MaterialFamily = (typeof MATERIAL_FAMILIES)[number];

// The guidance data names families as its sources do; the material table uses the service's
// own enum. This one table translates, so neither vocabulary has to change.
export const GUIDANCE_FAMILY_OF_MATERIAL: Record<MaterialFamily, GuidanceFamily> = {
  polycarbonate: 'polycarbonate',
  anhydride_cured_epoxy: 'epoxy_anhydride',
  cast_acrylic: 'cast_acrylic',
  soda_lime_glass: 'soda_lime_glass',
  allyl_diglycol_carbonate: 'other',
  polyurethane_rubber: 'other',
  other: 'other',
};

/** The material family a published entry serves; 'other' entries are never published. */
export const MATERIAL_FAMILY_OF_GUIDANCE: Record<GuidanceFamily, MaterialFamily> = {
  polycarbonate: 'polycarbonate',
  epoxy_anhydride: 'anhydride_cured_epoxy',
  cast_acrylic: 'cast_acrylic',
  soda_lime_glass: 'soda_lime_glass',
  other: 'other',
};
