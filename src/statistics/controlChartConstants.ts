/**
 * Control chart constants for subgroups (or moving-range spans) of size n, as tabulated in
 * ASTM STP 15D (Manual on Presentation of Data and Control Chart Analysis) and in
 * Montgomery, Introduction to Statistical Quality Control, Appendix VI. Values are recalled
 * from memory of those tables, not re-read [M]; for n = 2 they also follow in closed form
 * from the range of two normal values [C]: d2 = 2/√π, d3 = √(2 − 4/π), D4 = 1 + 3·d3/d2,
 * and E2 = 3/d2 by definition.
 */
export interface ControlChartConstantRow {
  /** Mean of the relative range W = R/σ. */
  d2: number;
  /** Standard deviation of W. */
  d3: number;
  /** Lower range-chart factor, D3 = max(0, 1 − 3·d3/d2). */
  D3: number;
  /** Upper range-chart factor, D4 = 1 + 3·d3/d2. */
  D4: number;
  /** Individuals-chart factor on the mean moving range, E2 = 3/d2. */
  E2: number;
}

// Only n = 2 is listed: the individuals chart uses moving ranges of two successive points.
export const CONTROL_CHART_CONSTANTS: Readonly<Record<2, ControlChartConstantRow>> = {
  2: { d2: 1.128, d3: 0.853, D3: 0, D4: 3.267, E2: 2.66 },
};

export const CONTROL_CHART_CONSTANTS_SOURCE =
  'ASTM STP 15D; Montgomery, Introduction to Statistical Quality Control, Appendix VI (from memory [M])';
