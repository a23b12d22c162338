import type { AnnealingGuidanceEntry, SourceRef } from './AnnealingGuidance.ts';
import { DIFFUSIVITY_LINE, PROPERTY_TABLE, WORKING_VALUE } from './guidanceSources.ts';

const MAKERS: SourceRef = {
  document: "Cast acrylic sheet makers' fabrication guidance",
  locator: 'annealing section: 80 °C, 1 h per mm (at least 2 h), cooling time ≈ thickness/4 h above 8 mm, release below about 50 °C',
  flag: 'read',
};

const COOLING_TABLE: SourceRef = {
  document: "A cast acrylic sheet maker's fabrication guidance",
  locator: 'annealing cooling-rate table by thickness, down to 49 °C (rates converted from °F/h)',
  flag: 'read',
};

const TABLE_ROWS = [
  { minThicknessMm: 1.5, maxThicknessMm: 4.5, rateCPerH: 78 },
  { minThicknessMm: 6, maxThicknessMm: 9, rateCPerH: 30 },
  { minThicknessMm: 12, maxThicknessMm: 18, rateCPerH: 14 },
  { minThicknessMm: 24, maxThicknessMm: 24, rateCPerH: 10 },
  { minThicknessMm: 38, maxThicknessMm: 44, rateCPerH: 6.7 },
  { minThicknessMm: 51, maxThicknessMm: 51, rateCPerH: 5.6 },
];

/** Cast acrylic sheet, annealed just below its deflection temperature per the makers' guidance. */
export const CAST_ACRYLIC_GUIDANCE: AnnealingGuidanceEntry = {
  key: 'cast-acrylic-sheet.maker-guidance',
  title: 'Cast acrylic sheet: anneal at 80 °C (makers’ fabrication guidance)',
  materialFamily: 'cast_acrylic',
  heating: [],
  heatingRateToSoak: {
    kind: 'thickness_table',
    rows: TABLE_ROWS,
    source: {
      document: COOLING_TABLE.document,
      locator: 'cooling-rate table applied to heating (heating no faster than the cooling rate is common practice; the guidance gives no heating rate)',
      flag: 'common_practice',
    },
  },
  soak: {
    temperature: { kind: 'absolute', temperatureC: { value: 80, source: MAKERS } },
    time: { hoursPerMm: { value: 1, source: MAKERS }, minimumH: { value: 2, source: MAKERS } },
  },
  cooling: [
    {
      rate: { kind: 'thickness_table', rows: TABLE_ROWS, source: COOLING_TABLE },
      to: { kind: 'absolute', temperatureC: { value: 49, range: [49, 50], source: COOLING_TABLE } },
      minimumDuration: {
        hoursPerMm: { value: 0.25, source: MAKERS },
        appliesAboveThicknessMm: { value: 8, source: MAKERS },
      },
    },
  ],
  thermalDiffusivityMm2PerS: {
    value: 0.109,
    source: { document: PROPERTY_TABLE, locator: `${DIFFUSIVITY_LINE}, cast acrylic (PMMA)`, flag: 'read' },
  },
  allowedGradientC: { value: 2, source: WORKING_VALUE },
  notes: [
    'Two maker rules govern cooling: the rate table and, above 8 mm, a cooling time of about thickness/4 h; the slower of the two is used.',
    'Glass transition about 105 °C (Crawford, Plastics Engineering, [R]); the soak stays well below it.',
  ],
};
