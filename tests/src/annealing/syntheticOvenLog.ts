import type { PlanSegment } from '../../../src/annealing/AnnealingPlan.ts';
import type { OvenLogSample } from '../../../src/annealing/OvenLogComparison.ts';
import { plannedTemperatures } from '../../../src/annealing/plannedTemperatures.ts';

/** Small repeatable generator (mulberry32) so noisy test logs are the same on every run. */
export function repeatableRandom(stream: number): () => number {
  let a = stream >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/**
 * A log that follows the plan every `stepH`, with Gaussian noise of `noiseC` (Box–Muller), an
 * optional `shape` that rewrites the ideal temperature (to plant a fault) and an optional gap.
 */
export function syntheticOvenLog(
  segments: readonly PlanSegment[],
  options: {
    stepH: number;
    noiseC: number;
    stream: number;
    extraH?: number;
    shape?: (tH: number, plannedC: number) => number;
    gap?: [number, number];
  },
): OvenLogSample[] {
  const last = segments[segments.length - 1]!;
  const endH = last.startH + last.durationH + (options.extraH ?? 0);
  const times: number[] = [];
  for (let i = 0; i * options.stepH <= endH + 1e-9; i += 1) {
    const t = i * options.stepH;
    if (options.gap && t > options.gap[0] && t < options.gap[1]) continue;
    times.push(t);
  }
  const planned = plannedTemperatures(segments, times);
  const rand = repeatableRandom(options.stream);
  return times.map((t, i) => {
    const ideal = planned[i] ?? last.endTemperatureC;
    const shaped = options.shape ? options.shape(t, ideal) : ideal;
    const noise = Math.sqrt(-2 * Math.log(1 - rand())) * Math.cos(2 * Math.PI * rand()) * options.noiseC;
    return { elapsedH: t, temperatureC: shaped + noise };
  });
}
