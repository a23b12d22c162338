import { requireNumber } from '../guards/requireNumber.ts';
import { CONTROL_CHART_CONSTANTS, CONTROL_CHART_CONSTANTS_SOURCE } from './controlChartConstants.ts';
import { flagRunRules, type RunRule, type RunRuleOptions } from './flagRunRules.ts';

export interface ChartPointInput {
  /** Position on the time axis (a date string, a sequence number...), in time order. */
  x: string | number;
  value: number;
}

export interface ChartPoint extends ChartPointInput {
  /** |value − previous value|; null for the first point. */
  movingRange: number | null;
  movingRangeAboveLimit: boolean;
  rules: RunRule[];
}

export interface IndividualsMovingRangeChart {
  defined: true;
  pointCount: number;
  centreLine: number;
  /** Mean of the n = 2 moving ranges, MR̄. */
  meanMovingRange: number;
  /** Short-term σ estimate MR̄/d2. */
  sigmaEstimate: number;
  individuals: { upperLimit: number; lowerLimit: number };
  movingRangeChart: { centreLine: number; upperLimit: number; lowerLimit: 0 };
  points: ChartPoint[];
  /** The rules evaluated, with the variant of each, so a reader knows what a flag means. */
  rulesApplied: { rule: RunRule; description: string }[];
  warnings: string[];
  constantsSource: string;
}

// Montgomery and ASTM STP 15D both advise 20–25 points before limits are trusted [M].
const PROVISIONAL_BELOW = 20;

const RULE_DESCRIPTIONS: Record<RunRule, string> = {
  beyond_limits: 'a point outside x̄ ± 2.66·MR̄ (3σ; Western Electric rule 1)',
  run_of_8_one_side: '8 consecutive points on one side of the centre line (Western Electric count; Nelson uses 9)',
  trend_of_6: '6 consecutive points steadily rising or falling (Nelson trend rule)',
  two_of_three_beyond_2_sigma: '2 of 3 consecutive points beyond 2σ on one side (Western Electric zone rule)',
};

/**
 * Individuals and moving-range (I-MR) chart of a series taken in the order given: centre
 * line x̄, MR̄ from successive pairs, individuals limits x̄ ± E2·MR̄ (E2 = 2.66, i.e. ±3σ̂ with
 * σ̂ = MR̄/d2), moving-range upper limit D4·MR̄ (D4 = 3.267, lower limit 0), and per point the
 * run rules of `flagRunRules`. Fewer than 2 points give `{ defined: false }`; fewer than 20
 * add a warning that the limits are provisional.
 *
 * @example
 * individualsMovingRangeChart([
 *   { x: 1, value: 0.1 }, { x: 2, value: 0.14 }, { x: 3, value: 0.12 }, { x: 4, value: 0.16 },
 * ]);
 * // { centreLine: 0.13, meanMovingRange: 0.03333, sigmaEstimate: 0.02955,
 * //   individuals: { upperLimit: 0.21867, lowerLimit: 0.04133 },
 * //   movingRangeChart: { centreLine: 0.03333, upperLimit: 0.1089, lowerLimit: 0 },
 * //   points: [{ x: 1, value: 0.1, movingRange: null, movingRangeAboveLimit: false, rules: [] }, ...],
 * //   rulesApplied: [{ rule: 'beyond_limits', description: 'a point outside x̄ ± 2.66·MR̄ ...' }, ...],
 * //   warnings: ['only 4 points: limits are provisional until about 20 points'], ... }
 */
export function individualsMovingRangeChart(
  points: readonly ChartPointInput[],
  options: RunRuleOptions = {},
): IndividualsMovingRangeChart | { defined: false; reason: string } {
  if (points.length < 2) {
    return { defined: false, reason: `a moving range needs at least 2 points, got ${points.length}` };
  }
  const values = points.map((p, i) => {
    if (typeof p.x === 'number') requireNumber(`points[${i}].x`, p.x);
    return requireNumber(`points[${i}].value`, p.value);
  });
  const { d2, D4, E2 } = CONTROL_CHART_CONSTANTS[2];
  const centreLine = values.reduce((s, v) => s + v, 0) / values.length;
  const ranges = values.slice(1).map((v, i) => Math.abs(v - values[i]!));
  const meanMovingRange = ranges.reduce((s, r) => s + r, 0) / ranges.length;
  const movingRangeUpper = D4 * meanMovingRange;
  const halfWidth = E2 * meanMovingRange;
  // Identical values sit a rounding error off their own mean; rules would fire on that noise.
  const flags =
    meanMovingRange === 0 ? values.map((): RunRule[] => []) : flagRunRules(values, centreLine, halfWidth, options);
  const warnings: string[] = [];
  if (values.length < PROVISIONAL_BELOW) {
    warnings.push(`only ${values.length} points: limits are provisional until about ${PROVISIONAL_BELOW} points`);
  }
  if (meanMovingRange === 0) warnings.push('no point-to-point variation: the limits collapse onto the centre line');
  return {
    defined: true,
    pointCount: values.length,
    centreLine,
    meanMovingRange,
    sigmaEstimate: meanMovingRange / d2,
    individuals: { upperLimit: centreLine + halfWidth, lowerLimit: centreLine - halfWidth },
    movingRangeChart: { centreLine: meanMovingRange, upperLimit: movingRangeUpper, lowerLimit: 0 },
    points: points.map((p, i) => {
      const movingRange = i === 0 ? null : ranges[i - 1]!;
      return {
        x: p.x,
        value: p.value,
        movingRange,
        movingRangeAboveLimit: movingRange !== null && movingRange > movingRangeUpper,
        rules: flags[i]!,
      };
    }),
    rulesApplied: (Object.keys(RULE_DESCRIPTIONS) as RunRule[])
      .filter((rule) => rule !== 'two_of_three_beyond_2_sigma' || options.twoOfThreeBeyondTwoSigma)
      .map((rule) => ({ rule, description: RULE_DESCRIPTIONS[rule] })),
    warnings,
    constantsSource: CONTROL_CHART_CONSTANTS_SOURCE,
  };
}
