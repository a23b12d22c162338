/** Rolling oven rate at each sample: the window it was taken over and its slope, or null before a full window. */
export interface RollingRates {
  /** Index of the first sample of the window ending at each sample; -1 where no full window exists yet. */
  windowStart: number[];
  rateCPerH: (number | null)[];
}

/**
 * The ordinary least-squares slope of temperature against time over the window ending at each
 * sample: the latest start sample at least `windowH` earlier. A two-point difference over the
 * window would carry the noise of both end samples undamped; the fitted slope averages every
 * sample in between, so its scatter falls as σ/√Σ(t − t̄)². The slope is a positively weighted
 * mean of the sample-to-sample rates, so a window over a planned corner never reads faster
 * than the faster side of it. Sliding centred sums (Welford's update, run forward to add a
 * sample and backward to drop one) keep it linear in the number of samples without the
 * cancellation that raw Σt² suffers far from t = 0; they are rebuilt from the window's own
 * samples each time as many samples have left as it holds, so rounding cannot build up over a
 * long log and the cost stays linear. `timesH` must not decrease; `windowH` > 0.
 *
 * @example
 * rollingRateCPerH([0, 0.25, 0.5, 0.75, 1], [20, 21, 21, 23, 24], 0.5);
 * // { windowStart: [-1, -1, 0, 1, 2], rateCPerH: [null, null, 2, 4, 6] }
 */
export function rollingRateCPerH(timesH: readonly number[], temperaturesC: readonly number[], windowH: number): RollingRates {
  const windowStart = new Array<number>(timesH.length).fill(-1);
  const rateCPerH = new Array<number | null>(timesH.length).fill(null);
  let count = 0;
  let meanT = 0;
  let meanC = 0;
  let sumSqT = 0;
  let sumTC = 0;
  const add = (t: number, c: number): void => {
    count += 1;
    const dt = t - meanT;
    meanT += dt / count;
    meanC += (c - meanC) / count;
    sumSqT += dt * (t - meanT);
    sumTC += dt * (c - meanC);
  };
  const drop = (t: number, c: number): void => {
    count -= 1;
    const dtAfter = t - meanT;
    meanT -= dtAfter / count;
    const dtBefore = t - meanT;
    sumSqT -= dtBefore * dtAfter;
    sumTC -= dtBefore * (c - meanC);
    meanC -= (c - meanC) / count;
  };
  let lo = 0;
  let droppedSinceRebuild = 0;
  for (let i = 0; i < timesH.length; i += 1) {
    const ti = timesH[i]!;
    add(ti, temperaturesC[i]!);
    while (lo + 1 < i && ti - timesH[lo + 1]! >= windowH) {
      drop(timesH[lo]!, temperaturesC[lo]!);
      lo += 1;
      droppedSinceRebuild += 1;
    }
    if (droppedSinceRebuild >= count) {
      count = meanT = meanC = sumSqT = sumTC = 0;
      for (let m = lo; m <= i; m += 1) add(timesH[m]!, temperaturesC[m]!);
      droppedSinceRebuild = 0;
    }
    if (i > lo && ti - timesH[lo]! >= windowH) {
      windowStart[i] = lo;
      rateCPerH[i] = sumTC / sumSqT;
    }
  }
  return { windowStart, rateCPerH };
}
