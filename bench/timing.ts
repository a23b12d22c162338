import { percentileLinear } from '../src/statistics/percentileLinear.ts';

export interface Timing {
  medianMs: number;
  p95Ms: number;
  runs: number;
}

export function timingOf(samplesMs: readonly number[]): Timing {
  const sorted = [...samplesMs].sort((a, b) => a - b);
  return { medianMs: percentileLinear(sorted, 0.5), p95Ms: percentileLinear(sorted, 0.95), runs: sorted.length };
}

export async function timed(run: () => Promise<unknown>): Promise<number> {
  const started = performance.now();
  await run();
  return performance.now() - started;
}
