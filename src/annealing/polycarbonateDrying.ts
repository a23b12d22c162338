import type { DryingPreStep, SourceRef } from './AnnealingGuidance.ts';

const DRYING_TABLE: SourceRef = {
  document: "A polycarbonate sheet maker's drying guidance",
  locator: 'drying time at 125 °C by sheet thickness',
  flag: 'read',
};

/** Drying before annealing: moisture in polycarbonate sheet foams or hazes it when heated. */
export const POLYCARBONATE_DRYING: DryingPreStep = {
  kind: 'drying',
  temperatureC: { value: 125, source: DRYING_TABLE },
  source: DRYING_TABLE,
  rows: [
    { thicknessMm: 1, durationH: 1.5 },
    { thicknessMm: 2, durationH: 4 },
    { thicknessMm: 3, durationH: 7 },
    { thicknessMm: 4, durationH: 12 },
    { thicknessMm: 5, durationH: 18 },
    { thicknessMm: 6, durationH: 26 },
    { thicknessMm: 8, durationH: 45 },
  ],
};
