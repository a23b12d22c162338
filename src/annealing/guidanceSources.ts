import type { SourceRef } from './AnnealingGuidance.ts';

// Sources shared by several catalogue entries. Flags follow the project's reference sheet:
// [R] → 'read', [M] → 'from_memory', [C] → 'derived'; unwritten working values → 'common_practice'.

export const PROPERTY_TABLE = 'fringe-ledger reference sheet, photoelastic and thermal property table';

export const DIFFUSIVITY_LINE = 'thermal diffusivity line α = k/(ρ·cp)';

export const WORKING_VALUE: SourceRef = {
  document: 'fringe-ledger working value (common practice, no document; a lab should set its own)',
  locator: 'allowed centre-to-surface temperature difference during ramps',
  flag: 'common_practice',
};

export const ROOM_RELEASE: SourceRef = {
  document: 'fringe-ledger working value (common practice, no document)',
  locator: 'release near room temperature, where the model can be handled',
  flag: 'common_practice',
};

export const SLAB_LAG: SourceRef = {
  document: 'Slab conduction, quasi-steady ramp: centre lags surface by R·L²/(2α)',
  locator: 'fringe-ledger reference sheet, "Slab conduction" [C]',
  flag: 'derived',
};
