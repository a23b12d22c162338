/** Run rules for a chart of individual values; ids are stable for API clients. */
export type RunRule = 'beyond_limits' | 'run_of_8_one_side' | 'trend_of_6' | 'two_of_three_beyond_2_sigma';

export interface RunRuleOptions {
  /** Also apply 2-of-3-beyond-2σ (more sensitive, more false alarms). Default false. */
  twoOfThreeBeyondTwoSigma?: boolean;
}

const RUN_LENGTH = 8;
const TREND_LENGTH = 6;

// Marks every point of each maximal stretch whose key is the same non-zero sign for at
// least minLength consecutive keys; `offset` maps key positions onto point positions.
function flagStretches(keys: number[], minLength: number, offset: number, mark: (point: number) => void): void {
  let start = 0;
  for (let i = 1; i <= keys.length; i++) {
    if (i < keys.length && keys[i] === keys[start]) continue;
    if (keys[start] !== 0 && i - start >= minLength) {
      for (let k = start; k < i + offset; k++) mark(k);
    }
    start = i;
  }
}

/**
 * Flags run-rule signals on an individuals chart, per point, in the order given, for control
 * limits at centreLine ± limitHalfWidth (the 3σ distance, so 2σ is ⅔ of it):
 * - `beyond_limits`: the point lies strictly outside the limits;
 * - `run_of_8_one_side`: it belongs to 8 or more consecutive points strictly on one side of
 *   the centre line (the Western Electric count; Nelson's variant asks for 9); a point on
 *   the line ends a run;
 * - `trend_of_6`: it belongs to 6 or more consecutive points each strictly above (or each
 *   strictly below) the one before (Nelson's trend rule); equal neighbours end a trend;
 * - `two_of_three_beyond_2_sigma` (opt-in): it lies beyond 2σ on a side where 2 of 3
 *   consecutive points do (Western Electric zone rule).
 * Points in a signalling stretch are all flagged, not only the one that completes it.
 *
 * @example
 * flagRunRules([0.1, 0.1, 0.5], 0.1, 0.15);
 * // [[], [], ['beyond_limits']]
 */
export function flagRunRules(
  values: readonly number[],
  centreLine: number,
  limitHalfWidth: number,
  options: RunRuleOptions = {},
): RunRule[][] {
  const flags: RunRule[][] = values.map(() => []);
  const mark = (rule: RunRule) => (point: number) => {
    const list = flags[point]!;
    if (!list.includes(rule)) list.push(rule);
  };
  values.forEach((v, i) => {
    if (Math.abs(v - centreLine) > limitHalfWidth) mark('beyond_limits')(i);
  });
  flagStretches(values.map((v) => Math.sign(v - centreLine)), RUN_LENGTH, 0, mark('run_of_8_one_side'));
  // Key i is the direction of the step from point i to point i + 1, so a stretch of
  // TREND_LENGTH − 1 steps spans TREND_LENGTH points.
  const steps = values.slice(1).map((v, i) => Math.sign(v - values[i]!));
  flagStretches(steps, TREND_LENGTH - 1, 1, mark('trend_of_6'));
  if (options.twoOfThreeBeyondTwoSigma) {
    for (let i = 0; i + 3 <= values.length; i++) {
      for (const side of [1, -1]) {
        const window = [i, i + 1, i + 2].filter((k) => side * (values[k]! - centreLine) > (2 / 3) * limitHalfWidth);
        if (window.length >= 2) window.forEach(mark('two_of_three_beyond_2_sigma'));
      }
    }
  }
  return flags;
}
