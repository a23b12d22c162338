import type { AnnealingGuidanceCatalogue } from './AnnealingGuidance.ts';
import { CAST_ACRYLIC_GUIDANCE } from './castAcrylicGuidance.ts';
import { CAST_EPOXY_GUIDANCE } from './castEpoxyGuidance.ts';
import { POLYCARBONATE_COMMON_PRACTICE, POLYCARBONATE_ZAKERI_2013 } from './polycarbonateGuidance.ts';
import { SODA_LIME_GLASS_GUIDANCE } from './sodaLimeGlassGuidance.ts';

/**
 * The built-in annealing guidance. The version changes whenever any entry's content changes,
 * so a stored plan can name exactly which guidance it came from.
 */
export const ANNEALING_GUIDANCE_CATALOGUE: AnnealingGuidanceCatalogue = {
  version: '2026-12-01.1',
  entries: [
    CAST_ACRYLIC_GUIDANCE,
    POLYCARBONATE_ZAKERI_2013,
    POLYCARBONATE_COMMON_PRACTICE,
    CAST_EPOXY_GUIDANCE,
    SODA_LIME_GLASS_GUIDANCE,
  ],
};

/** Printed with every schedule the service recommends. */
export const ANNEALING_CAUTIONS: readonly string[] = [
  'Oven walls, racks, trays and the models themselves stay hot long after a cycle ends: use heat-resistant gloves and let parts cool before handling.',
  'Heated resins and acrylics give off vapours: run the oven vented or under extraction and do not lean into a hot oven.',
  'Do not let the oven overshoot the soak temperature: above the softening range a model sags, creeps or distorts and is lost.',
  'Plastics can ignite or decompose if a controller fails: use an oven with an independent over-temperature cut-out, never an open flame or a domestic oven, and do not leave long cycles unattended without that cut-out.',
  'Epoxy and glass models are brittle: never anneal a model under load, support it evenly, and handle it as if it might crack.',
  "This schedule is guidance only: the laboratory's own safety rules, local codes and licensed practice take precedence.",
];
