import { describe, expect, it } from 'vitest';
import { plannedTemperatures } from '../../../src/annealing/plannedTemperatures.ts';

const segments = [
  { startH: 0, durationH: 2, startTemperatureC: 20, endTemperatureC: 80 },
  { startH: 2, durationH: 1, startTemperatureC: 80, endTemperatureC: 80 },
  { startH: 3, durationH: 3, startTemperatureC: 80, endTemperatureC: 50 },
];

describe('plannedTemperatures', () => {
  it('interpolates along ramps and soaks, null after the plan ends', () => {
    expect(plannedTemperatures(segments, [0, 1, 2, 2.5, 4.5, 6, 6.1])).toEqual([20, 50, 80, 80, 65, 50, null]);
  });
});
