import { DomainError } from '../errors/DomainError.ts';
import { requireNumber } from '../guards/requireNumber.ts';
import { OPPOSITE_U_NOTCH_FIT, OPPOSITE_U_NOTCH_SOURCE } from './oppositeUNotchCoefficients.ts';

export interface HandbookKt {
  /** Kt referred to the net-section nominal stress P/((D − 2h)·t). */
  ktNetSection: number;
  depthToRadiusRatio: number;
  /** 2h/D. */
  notchedWidthFraction: number;
  source: string;
  warnings: string[];
}

/**
 * Handbook Kt for two opposite U-notches (depth h, root radius r) in a strip of gross width D
 * in tension, from the published cubic curve fit in 2h/D with coefficients in √(h/r)
 * (see oppositeUNotchCoefficients.ts, recalled from memory [M]). Refuses h/r outside
 * 0.1–50 and geometry without a ligament. Kt on the net section cannot be below 1 (the peak
 * of a stress is never below its mean); where the cubic dips under 1 near 2h/D → 1, 1 is
 * returned with a warning.
 *
 * @example
 * ktOppositeUNotchesFiniteStrip(5, 5, 40);
 * // { ktNetSection: 2.113, depthToRadiusRatio: 1, notchedWidthFraction: 0.25, source: '…', warnings: [] }
 */
export function ktOppositeUNotchesFiniteStrip(notchDepthMm: number, rootRadiusMm: number, grossWidthMm: number): HandbookKt {
  const h = requireNumber('notchDepthMm', notchDepthMm, { above: 0 });
  const r = requireNumber('rootRadiusMm', rootRadiusMm, { above: 0 });
  const d = requireNumber('grossWidthMm', grossWidthMm, { above: 0 });
  const hr = h / r;
  const x = (2 * h) / d;
  if (!(x < 1)) {
    throw new DomainError('invalid_input', 'two notches of this depth leave no net section', [
      { field: 'notchDepthMm', message: `2h/D must be below 1, got ${x}` },
    ]);
  }
  const branch = OPPOSITE_U_NOTCH_FIT.find(
    (b) => hr >= b.minDepthToRadius && (b.upperExclusive ? hr < b.maxDepthToRadius : hr <= b.maxDepthToRadius),
  );
  if (branch === undefined) {
    throw new DomainError('invalid_input', `h/r = ${hr} is outside the curve fit's range 0.1–50`, [
      { field: 'rootRadiusMm', message: `notch depth / root radius must lie in 0.1–50, got ${hr}` },
    ]);
  }
  const s = Math.sqrt(hr);
  const [c1, c2, c3, c4] = branch.c.map(([a, b, c]) => a + b * s + c * hr) as [number, number, number, number];
  const fit = c1 + c2 * x + c3 * x ** 2 + c4 * x ** 3;
  const warnings = fit < 1 ? [`curve fit gave ${fit.toFixed(4)} < 1 (fit artefact near 2h/D → 1); 1 returned`] : [];
  return {
    ktNetSection: Math.max(1, fit),
    depthToRadiusRatio: hr,
    notchedWidthFraction: x,
    source: OPPOSITE_U_NOTCH_SOURCE,
    warnings,
  };
}
