import type { AnnealingGuidanceEntry, SourceRef } from './AnnealingGuidance.ts';
import { PROPERTY_TABLE, ROOM_RELEASE, WORKING_VALUE } from './guidanceSources.ts';

const POINTS: SourceRef = {
  document: `${PROPERTY_TABLE}, soda-lime glass (points as defined in ASTM C336 fibre elongation and ASTM C598 beam bending)`,
  locator: 'annealing point (viscosity 10^13 poise) 546–548 °C; strain point (10^14.5 poise) 511–514 °C',
  flag: 'read',
};

const DIFFUSIVITY = 0.43;
const GRADIENT_C = 1;
// Classical annealing theory: the permissible rate falls with the square of thickness. The constant
// is the slab lag formula solved for the rate: R = 2αΔT/L² = 8αΔT/t², per hour.
const SLOW_CONSTANT = 8 * DIFFUSIVITY * GRADIENT_C * 3600;

/** Soda-lime glass annealed at its annealing point (annealing only, not tempering). */
export const SODA_LIME_GLASS_GUIDANCE: AnnealingGuidanceEntry = {
  key: 'soda-lime-glass.annealing-point',
  title: 'Soda-lime glass: soak at the annealing point, cool slowly through the strain point',
  materialFamily: 'soda_lime_glass',
  heating: [],
  heatingRateToSoak: { kind: 'from_gradient' },
  soak: {
    temperature: {
      kind: 'relative',
      reference: 'annealing_point',
      referenceTemperatureC: { value: 546, range: [546, 548], source: POINTS },
      offsetC: { value: 0, source: { ...WORKING_VALUE, locator: 'soak at the annealing point itself' } },
    },
    time: {
      minimumH: {
        value: 0.25,
        source: { ...WORKING_VALUE, locator: 'stress is relieved in minutes at the annealing point [R]; 15 min chosen' },
      },
    },
  },
  cooling: [
    {
      rate: {
        kind: 'inverse_square',
        constantCMm2PerH: {
          value: SLOW_CONSTANT,
          source: {
            document: 'Classical annealing theory: rate ∝ 1/thickness² [C]',
            locator: 'constant = 8·α·ΔT·3600 with α 0.43 mm²/s (lower end, [C]) and ΔT 1 °C (working value, common practice)',
            flag: 'derived',
          },
        },
      },
      to: {
        kind: 'relative',
        reference: 'strain_point',
        referenceTemperatureC: { value: 511, range: [511, 514], source: POINTS },
        offsetC: { value: -10, source: { ...WORKING_VALUE, locator: 'slow cooling continued 10 °C past the strain point' } },
      },
    },
    {
      rate: {
        kind: 'inverse_square',
        constantCMm2PerH: {
          value: SLOW_CONSTANT,
          source: {
            ...WORKING_VALUE,
            locator: 'below the strain point no stress freezes in, but thermal shock still cracks glass: kept at the slow rate (conservative)',
          },
        },
      },
      to: { kind: 'absolute', temperatureC: { value: 50, source: ROOM_RELEASE } },
    },
  ],
  thermalDiffusivityMm2PerS: {
    value: DIFFUSIVITY,
    range: [0.43, 0.5],
    source: { document: PROPERTY_TABLE, locator: 'thermal diffusivity line, glass [C] (lower end used: slower diffusion, larger lag)', flag: 'derived' },
  },
  allowedGradientC: { value: GRADIENT_C, source: WORKING_VALUE },
  notes: ['Annealing only: tempering (fast quench from above the annealing point) is a different process.'],
};
