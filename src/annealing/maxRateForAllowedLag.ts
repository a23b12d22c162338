import { requireNumber } from '../guards/requireNumber.ts';

/**
 * The ramp rate whose quasi-steady centre-to-surface lag equals `allowedLagC`:
 * R = 2α·ΔT/L², returned in °C/h. It falls with the square of the half-thickness.
 *
 * @example
 * maxRateForAllowedLag({ allowedLagC: 2, halfThicknessMm: 12.5, diffusivityMm2PerS: 0.109 }); // 10.05 °C/h
 */
export function maxRateForAllowedLag(input: { allowedLagC: number; halfThicknessMm: number; diffusivityMm2PerS: number }): number {
  const allowed = requireNumber('allowedLagC', input.allowedLagC, { above: 0 });
  const halfThicknessMm = requireNumber('halfThicknessMm', input.halfThicknessMm, { above: 0 });
  const alpha = requireNumber('diffusivityMm2PerS', input.diffusivityMm2PerS, { above: 0 });
  return ((2 * alpha * allowed) / (halfThicknessMm * halfThicknessMm)) * 3600;
}
