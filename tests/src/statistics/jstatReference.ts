import { createRequire } from 'node:module';

// jstat ships no type declarations; this names only the parts the tests use, so the
// reference library stays a test-only dependency with a typed surface.
export interface JStatReference {
  gammaln(x: number): number;
  ibeta(x: number, a: number, b: number): number;
  normal: { cdf(x: number, mean: number, sd: number): number };
  studentt: { cdf(x: number, dof: number): number; inv(p: number, dof: number): number };
  models: {
    ols(
      endog: number[],
      exog: number[][],
    ): { coef: number[]; t: { se: number[] }; R2: number; SSE: number };
  };
}

export const jStat = createRequire(import.meta.url)('jstat') as JStatReference;
