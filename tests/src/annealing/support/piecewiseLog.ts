/** Samples every `stepH` from 0 to `endH` of the straight-line path through the corner points (time h, temperature °C). */
export function piecewiseLog(corners: readonly [number, number][], stepH: number, endH: number): { timesH: number[]; temperaturesC: number[] } {
  const timesH: number[] = [];
  for (let i = 0; i * stepH <= endH; i += 1) timesH.push(i * stepH);
  const temperaturesC = timesH.map((t) => {
    const k = corners.findIndex(([ct]) => ct >= t);
    if (k <= 0) return k === 0 ? corners[0]![1] : corners[corners.length - 1]![1];
    const [t0, c0] = corners[k - 1]!;
    const [t1, c1] = corners[k]!;
    return c0 + ((t - t0) / (t1 - t0)) * (c1 - c0);
  });
  return { timesH, temperaturesC };
}
