import { DomainError } from '../errors/DomainError.ts';
import { requireNumber } from '../guards/requireNumber.ts';
import { normalCdf } from './normalCdf.ts';

export interface MannWhitneyResult {
  defined: true;
  nA: number;
  nB: number;
  /** Pairs (a, b) with a > b, ties counted ½: U for group a. */
  uA: number;
  /** nA·nB − uA. */
  uB: number;
  /** min(uA, uB), the value printed tables are indexed by. */
  u: number;
  /** Normal approximation with tie and continuity corrections; positive when a ranks higher. */
  z: number;
  pTwoSided: number;
  /** (uA − uB)/(nA·nB) in −1..1: P(a > b) − P(a < b); positive when a tends to be larger. */
  rankBiserial: number;
}

export type MannWhitneyOutcome = MannWhitneyResult | { defined: false; reason: string };

function requireValues(field: string, values: readonly number[]): void {
  if (values.length === 0) {
    throw new DomainError('invalid_input', `${field} must not be empty`, [{ field, message: 'needs at least one value' }]);
  }
  values.forEach((v, i) => requireNumber(`${field}[${i}]`, v));
}

/**
 * Mann–Whitney U (Wilcoxon rank-sum) comparison of two independent samples. Tied values get
 * mid-ranks; z uses the tie-corrected variance nA·nB/12·((n + 1) − Σ(t³ − t)/(n(n − 1))) and
 * moves |uA − nA·nB/2| half a unit towards zero (continuity correction). The normal
 * approximation is rough below about 8 values per group; exact tables are then better.
 * Returns `{ defined: false }` when every value is tied, since ranks then carry nothing.
 *
 * @example
 * mannWhitneyU([0.31, 0.28, 0.35, 0.4], [0.22, 0.25, 0.28, 0.2, 0.26]);
 * // { defined: true, uA: 19.5, uB: 0.5, u: 0.5, z: 2.2138, pTwoSided: 0.02684,
 * //   rankBiserial: 0.95, ... }
 */
export function mannWhitneyU(a: readonly number[], b: readonly number[]): MannWhitneyOutcome {
  requireValues('a', a);
  requireValues('b', b);
  const pooled = [...a.map((value) => ({ value, inA: true })), ...b.map((value) => ({ value, inA: false }))];
  pooled.sort((p, q) => p.value - q.value);
  const at = (i: number): { value: number; inA: boolean } => pooled[i]!;
  const n = pooled.length;
  let rankSumA = 0;
  let tieTerm = 0;
  for (let start = 0; start < n; ) {
    let end = start;
    while (end + 1 < n && at(end + 1).value === at(start).value) end++;
    const midRank = (start + end) / 2 + 1;
    const tied = end - start + 1;
    tieTerm += tied ** 3 - tied;
    for (let i = start; i <= end; i++) if (at(i).inA) rankSumA += midRank;
    start = end + 1;
  }
  const nA = a.length;
  const nB = b.length;
  const uA = rankSumA - (nA * (nA + 1)) / 2;
  const uB = nA * nB - uA;
  const variance = ((nA * nB) / 12) * (n + 1 - tieTerm / (n * (n - 1)));
  if (!(variance > 0)) {
    return { defined: false, reason: 'every value in both groups is tied, so the ranks carry no information' };
  }
  const offset = uA - (nA * nB) / 2;
  const z = (Math.sign(offset) * Math.max(0, Math.abs(offset) - 0.5)) / Math.sqrt(variance);
  return {
    defined: true,
    nA,
    nB,
    uA,
    uB,
    u: Math.min(uA, uB),
    z,
    pTwoSided: Math.min(1, 2 * normalCdf(-Math.abs(z))),
    rankBiserial: (uA - uB) / (nA * nB),
  };
}
