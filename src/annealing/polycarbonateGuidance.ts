import type { AnnealingGuidanceEntry, SourceRef, SourcedNumber } from './AnnealingGuidance.ts';
import { DIFFUSIVITY_LINE, PROPERTY_TABLE, ROOM_RELEASE, WORKING_VALUE } from './guidanceSources.ts';
import { POLYCARBONATE_DRYING } from './polycarbonateDrying.ts';

const ZAKERI: SourceRef = {
  document: 'Zakeri, Modares Mechanical Engineering 13(6):103–113 (2013)',
  locator: 'annealing cycle for polycarbonate models: 20 °C/h to 100 °C, hold 3 h; 5 °C/h to 140 °C; 1 °C/h to 156 °C; cool at the same rates',
  flag: 'read',
};

const PRACTICE: SourceRef = {
  document: 'Common annealing practice for polycarbonate models (recalled, not re-read)',
  locator: 'hold just below Tg (135–145 °C), cool at 2–5 °C/h or slower',
  flag: 'from_memory',
};

const DIFFUSIVITY: SourcedNumber = {
  value: 0.144,
  source: { document: PROPERTY_TABLE, locator: `${DIFFUSIVITY_LINE}, polycarbonate`, flag: 'read' },
};

const zakeri = (value: number) => ({ kind: 'fixed' as const, rateCPerH: { value, source: ZAKERI } });
const at = (value: number) => ({ kind: 'absolute' as const, temperatureC: { value, source: ZAKERI } });

/** The published multi-step cycle, which passes above Tg to 156 °C. */
export const POLYCARBONATE_ZAKERI_2013: AnnealingGuidanceEntry = {
  key: 'polycarbonate-sheet.zakeri-2013',
  title: 'Polycarbonate sheet: published multi-step cycle to 156 °C (Zakeri 2013)',
  materialFamily: 'polycarbonate',
  preSteps: [POLYCARBONATE_DRYING],
  heating: [
    {
      rate: zakeri(20),
      to: at(100),
      hold: { minimumH: { value: 3, source: ZAKERI } },
    },
    { rate: zakeri(5), to: at(140) },
  ],
  heatingRateToSoak: zakeri(1),
  soak: {
    temperature: at(156),
    time: {
      minimumH: {
        value: 0,
        source: { ...ZAKERI, locator: 'cycle as listed: no hold at the top temperature is stated' },
      },
    },
  },
  cooling: [
    { rate: zakeri(1), to: at(140) },
    { rate: zakeri(5), to: at(100) },
    { rate: zakeri(20), to: { kind: 'start_temperature', source: { ...ZAKERI, locator: 'cool at the same rates back to room temperature' } } },
  ],
  thermalDiffusivityMm2PerS: DIFFUSIVITY,
  allowedGradientC: { value: 2, source: WORKING_VALUE },
  notes: ['The top temperature lies above Tg (147–149 °C): support the model so it cannot sag.'],
};

/** Hold just below Tg, then a slow cool. */
export const POLYCARBONATE_COMMON_PRACTICE: AnnealingGuidanceEntry = {
  key: 'polycarbonate-sheet.common-practice',
  title: 'Polycarbonate sheet: hold just below Tg, cool slowly (common practice)',
  materialFamily: 'polycarbonate',
  preSteps: [POLYCARBONATE_DRYING],
  heating: [],
  heatingRateToSoak: {
    kind: 'from_gradient',
    capCPerH: { value: 20, source: { ...ZAKERI, locator: 'first heating ramp of the published cycle, used as a cap' } },
  },
  soak: {
    temperature: {
      kind: 'relative',
      reference: 'glass_transition',
      referenceTemperatureC: {
        value: 147,
        range: [147, 149],
        source: { document: 'Crawford, Plastics Engineering', locator: 'Table 1.8', flag: 'read' },
      },
      offsetC: { value: -7, range: [-12, -2], source: PRACTICE },
    },
    time: {
      minimumH: {
        value: 2,
        source: { ...WORKING_VALUE, locator: 'no hold time recalled; lengthened to the equilibration time where needed' },
      },
    },
  },
  cooling: [
    {
      rate: { kind: 'fixed', rateCPerH: { value: 2, range: [2, 5], source: PRACTICE } },
      to: { kind: 'absolute', temperatureC: { value: 40, source: ROOM_RELEASE } },
    },
  ],
  thermalDiffusivityMm2PerS: DIFFUSIVITY,
  allowedGradientC: { value: 2, source: WORKING_VALUE },
};
