import { describe, expect, it } from 'vitest';
import { COMMON_PRACTICE_FITNESS_CRITERIA } from '../../../src/acceptance/commonPracticeFitnessCriteria.ts';

describe('COMMON_PRACTICE_FITNESS_CRITERIA', () => {
  it('spans 0.1–0.2 fringe and 5–10 % of the test order [M] common practice', () => {
    expect(COMMON_PRACTICE_FITNESS_CRITERIA.usual).toEqual({ maxResidualFringeOrder: 0.2, maxResidualFractionOfTestOrder: 0.1 });
    expect(COMMON_PRACTICE_FITNESS_CRITERIA.strict).toEqual({ maxResidualFringeOrder: 0.1, maxResidualFractionOfTestOrder: 0.05 });
    expect(COMMON_PRACTICE_FITNESS_CRITERIA.flag).toMatch(/^\[M\] common practice/);
  });
});
