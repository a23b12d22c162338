import type { AnnealingGuidanceEntry, SourceRef } from './AnnealingGuidance.ts';
import { PROPERTY_TABLE, DIFFUSIVITY_LINE, ROOM_RELEASE, WORKING_VALUE } from './guidanceSources.ts';

const HANDBOOKS: SourceRef = {
  document: 'Experimental stress analysis handbooks, annealing practice for cast epoxy (recalled, not re-read)',
  locator: '5–10 °C/h to Tg + ≈10 °C, soak 1–4 h (longer for thick sections), 1–2 °C/h to ≈ Tg − 40 °C, then ≤ 5 °C/h',
  flag: 'from_memory',
};

const TG = {
  value: 130,
  range: [130, 140] as [number, number],
  source: { document: PROPERTY_TABLE, locator: 'anhydride-cured epoxy row, Tg (lower end used)', flag: 'read' as const },
};

/** Cast anhydride-cured epoxy, annealed just above Tg as the handbooks describe. */
export const CAST_EPOXY_GUIDANCE: AnnealingGuidanceEntry = {
  key: 'epoxy-anhydride-cast.handbook-practice',
  title: 'Cast anhydride-cured epoxy: anneal just above Tg (handbook practice)',
  materialFamily: 'epoxy_anhydride',
  heating: [],
  heatingRateToSoak: { kind: 'fixed', rateCPerH: { value: 5, range: [5, 10], source: HANDBOOKS } },
  soak: {
    temperature: {
      kind: 'relative',
      reference: 'glass_transition',
      referenceTemperatureC: TG,
      offsetC: { value: 10, source: HANDBOOKS },
    },
    time: { minimumH: { value: 1, source: HANDBOOKS }, maximumH: { value: 4, source: HANDBOOKS } },
  },
  cooling: [
    {
      rate: { kind: 'fixed', rateCPerH: { value: 1, range: [1, 2], source: HANDBOOKS } },
      to: { kind: 'relative', reference: 'glass_transition', referenceTemperatureC: TG, offsetC: { value: -40, source: HANDBOOKS } },
    },
    {
      rate: { kind: 'fixed', rateCPerH: { value: 5, source: HANDBOOKS } },
      to: { kind: 'absolute', temperatureC: { value: 30, source: ROOM_RELEASE } },
    },
  ],
  thermalDiffusivityMm2PerS: {
    value: 0.15,
    source: { document: PROPERTY_TABLE, locator: `${DIFFUSIVITY_LINE}, epoxy [C]`, flag: 'derived' },
  },
  allowedGradientC: { value: 2, source: WORKING_VALUE },
  notes: [
    'Above Tg the model is rubbery: support it evenly and keep it unloaded.',
    'The handbooks give a 1–4 h soak, longer for thick sections; the plan uses the band’s lower end plus any equilibration time, so choose a longer hold for thick castings.',
  ],
};
