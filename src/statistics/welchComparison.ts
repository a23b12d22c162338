import { DomainError } from '../errors/DomainError.ts';
import { requireNumber } from '../guards/requireNumber.ts';
import { arithmeticMean } from './arithmeticMean.ts';
import { sampleStandardDeviation } from './sampleStandardDeviation.ts';
import { studentTCdf } from './studentTCdf.ts';
import { studentTQuantile } from './studentTQuantile.ts';

export interface WelchResult {
  defined: true;
  nA: number;
  nB: number;
  meanA: number;
  meanB: number;
  /** meanA − meanB, in the unit of the data. */
  differenceOfMeans: number;
  standardError: number;
  /** Welch–Satterthwaite degrees of freedom (generally not an integer). */
  degreesOfFreedom: number;
  tStatistic: number;
  pTwoSided: number;
  confidence: number;
  confidenceInterval: { lower: number; upper: number };
}

export type WelchOutcome = WelchResult | { defined: false; reason: string };

/**
 * Welch's unequal-variances t comparison of two independent samples: difference of means
 * (a − b), its standard error √(s²a/na + s²b/nb), Welch–Satterthwaite degrees of freedom,
 * t statistic, two-sided p and a two-sided confidence interval for the difference.
 * Returns `{ defined: false }` when a group has fewer than two values (no variance estimate)
 * or when both groups have zero spread (the t statistic would divide by zero).
 *
 * @example
 * welchComparison([0.12, 0.15, 0.11, 0.14], [0.2, 0.18, 0.23, 0.21, 0.19]);
 * // { defined: true, differenceOfMeans: -0.072, standardError: 0.012543,
 * //   degreesOfFreedom: 6.7196, tStatistic: -5.7401, pTwoSided: 0.000817,
 * //   confidenceInterval: { lower: -0.10191, upper: -0.04209 }, ... }
 */
export function welchComparison(a: readonly number[], b: readonly number[], confidence = 0.95): WelchOutcome {
  requireNumber('confidence', confidence, { above: 0 });
  if (!(confidence < 1)) {
    throw new DomainError('invalid_input', `confidence must be less than 1, got ${confidence}`, [
      { field: 'confidence', message: 'must be < 1' },
    ]);
  }
  if (a.length < 2 || b.length < 2) {
    return { defined: false, reason: `each group needs at least 2 values for a variance (got ${a.length} and ${b.length})` };
  }
  const meanA = arithmeticMean(a, 'a');
  const meanB = arithmeticMean(b, 'b');
  const varianceOfMeanA = sampleStandardDeviation(a, 'a') ** 2 / a.length;
  const varianceOfMeanB = sampleStandardDeviation(b, 'b') ** 2 / b.length;
  const varianceOfDifference = varianceOfMeanA + varianceOfMeanB;
  if (varianceOfDifference === 0) {
    return { defined: false, reason: 'both groups have zero spread, so the t statistic is undefined' };
  }
  const standardError = Math.sqrt(varianceOfDifference);
  const degreesOfFreedom =
    varianceOfDifference ** 2 /
    (varianceOfMeanA ** 2 / (a.length - 1) + varianceOfMeanB ** 2 / (b.length - 1));
  const differenceOfMeans = meanA - meanB;
  const tStatistic = differenceOfMeans / standardError;
  const halfWidth = studentTQuantile(1 - (1 - confidence) / 2, degreesOfFreedom) * standardError;
  return {
    defined: true,
    nA: a.length,
    nB: b.length,
    meanA,
    meanB,
    differenceOfMeans,
    standardError,
    degreesOfFreedom,
    tStatistic,
    pTwoSided: 2 * studentTCdf(-Math.abs(tStatistic), degreesOfFreedom),
    confidence,
    confidenceInterval: { lower: differenceOfMeans - halfWidth, upper: differenceOfMeans + halfWidth },
  };
}
