import { describe, expect, it } from 'vitest';
import { CONTROL_CHART_CONSTANTS } from '../../../src/statistics/controlChartConstants.ts';

// For two normal values, |X1 − X2|/σ is √2 times a half-normal variable, so its mean is
// 2/√π and its variance 2 − 4/π [C]. The table values (ASTM STP 15D, Montgomery Appendix VI,
// from memory [M]) must be these, rounded to the table's three decimals.
describe('CONTROL_CHART_CONSTANTS for n = 2', () => {
  const row = CONTROL_CHART_CONSTANTS[2];
  const d2 = 2 / Math.sqrt(Math.PI);
  const d3 = Math.sqrt(2 - 4 / Math.PI);
  it('has d2 = 2/√π and d3 = √(2 − 4/π) to three decimals [C]', () => {
    expect(row.d2).toBeCloseTo(d2, 3);
    expect(row.d3).toBeCloseTo(d3, 3);
  });
  it('has D4 = 1 + 3·d3/d2 and D3 = 0 (1 − 3·d3/d2 is negative) [C]', () => {
    expect(row.D4).toBeCloseTo(1 + (3 * d3) / d2, 3);
    expect(1 - (3 * d3) / d2).toBeLessThan(0);
    expect(row.D3).toBe(0);
  });
  it('has E2 = 3/d2 from the tabulated d2 (2.660) [C]', () => {
    expect(row.E2).toBeCloseTo(3 / row.d2, 3);
  });
});
