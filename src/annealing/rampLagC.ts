import { requireNumber } from '../guards/requireNumber.ts';

/**
 * Quasi-steady centre-to-surface temperature difference of a slab whose surface follows a
 * ramp: ΔT = R·L²/(2α), with R converted from °C/h to °C/s. The lag builds up over the first
 * Fo ≈ 0.5 of a ramp and then stays at this value, so it bounds the lag along the ramp.
 *
 * @example
 * rampLagC({ rateCPerH: 30, halfThicknessMm: 3, diffusivityMm2PerS: 0.109 }); // 0.344 °C
 */
export function rampLagC(input: { rateCPerH: number; halfThicknessMm: number; diffusivityMm2PerS: number }): number {
  const rate = Math.abs(requireNumber('rateCPerH', input.rateCPerH));
  const halfThicknessMm = requireNumber('halfThicknessMm', input.halfThicknessMm, { above: 0 });
  const alpha = requireNumber('diffusivityMm2PerS', input.diffusivityMm2PerS, { above: 0 });
  return ((rate / 3600) * halfThicknessMm * halfThicknessMm) / (2 * alpha);
}
