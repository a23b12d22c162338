export interface SeriesPoint {
  x: number;
  value: number;
  flagged: boolean;
}

export interface BinnedSeries {
  /** Points drawn one by one: all of them when few, otherwise the flagged ones (capped). */
  points: SeriesPoint[];
  /** Per-bin min, mean and max when the series was too long to draw point by point. */
  bins: { x: number; min: number; mean: number; max: number }[];
  binned: boolean;
  total: number;
}

/**
 * Keeps an SVG's mark count bounded whatever the series length: up to `maxPoints` are drawn
 * as they are; beyond that the series becomes `maxBins` equal-count bins (min–mean–max, so a
 * spike still shows) plus at most `maxFlagged` flagged points, the ones a reader must see.
 *
 * @example
 * binSeries([{ x: 0, value: 1, flagged: false }, { x: 1, value: 3, flagged: true }], 10, 5, 5);
 * // { points: [both], bins: [], binned: false, total: 2 }
 */
export function binSeries(series: readonly SeriesPoint[], maxPoints = 600, maxBins = 300, maxFlagged = 200): BinnedSeries {
  if (series.length <= maxPoints) return { points: [...series], bins: [], binned: false, total: series.length };
  const size = Math.ceil(series.length / maxBins);
  const bins = [];
  for (let start = 0; start < series.length; start += size) {
    const chunk = series.slice(start, start + size);
    const values = chunk.map((p) => p.value);
    bins.push({ x: (chunk[0]!.x + chunk[chunk.length - 1]!.x) / 2, min: Math.min(...values), mean: values.reduce((s, v) => s + v, 0) / values.length, max: Math.max(...values) });
  }
  return { points: series.filter((p) => p.flagged).slice(0, maxFlagged), bins, binned: true, total: series.length };
}
