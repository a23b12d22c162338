import { requireNumber } from '../guards/requireNumber.ts';

/**
 * First eigenvalue ζ1 of transient conduction in a plane slab: the root of ζ·tan ζ = Bi on
 * (0, π/2). Bi = Infinity (surface held at the oven temperature) gives π/2.
 *
 * @example
 * slabEigenvalue(1);        // 0.8603 (to four digits)
 * slabEigenvalue(Infinity); // 1.5708
 */
export function slabEigenvalue(biot: number): number {
  if (biot === Number.POSITIVE_INFINITY) return Math.PI / 2;
  requireNumber('biot', biot, { above: 0 });
  // ζ sin ζ − Bi cos ζ has the same root without tan's pole, and rises monotonically on the
  // interval (from −Bi to π/2), so bisection always converges.
  const f = (z: number): number => z * Math.sin(z) - biot * Math.cos(z);
  let lo = 0;
  let hi = Math.PI / 2;
  for (let i = 0; i < 2000; i += 1) {
    const mid = 0.5 * (lo + hi);
    if (mid <= lo || mid >= hi) break;
    if (f(mid) < 0) lo = mid;
    else hi = mid;
  }
  return 0.5 * (lo + hi);
}
