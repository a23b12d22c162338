import { requireNumber } from '../guards/requireNumber.ts';

const SERIES_LIMIT = 3;
const FRACTION_TERMS = 200;

// erfc(z) for z ≥ 0. Below SERIES_LIMIT the all-positive series
// erf(z) = 2/√π · e^(−z²) · Σ 2ⁿ z^(2n+1) / (1·3·…·(2n+1)) avoids the cancellation of the
// alternating Maclaurin series; above it the Laplace continued fraction keeps the tail's
// relative precision, which a p-value needs.
function erfcNonNegative(z: number): number {
  const scale = Math.exp(-z * z) / Math.sqrt(Math.PI);
  if (z < SERIES_LIMIT) {
    let term = z;
    let sum = z;
    for (let n = 1; term > 1e-17 * sum; n++) {
      term *= (2 * z * z) / (2 * n + 1);
      sum += term;
    }
    return 1 - 2 * scale * sum;
  }
  let tail = z;
  for (let k = FRACTION_TERMS; k >= 1; k--) tail = z + k / 2 / tail;
  return scale / tail;
}

/**
 * Standard normal cumulative distribution function Φ(x) = ½·erfc(−x/√2).
 *
 * @example
 * normalCdf(1.959963984540054); // 0.9749999999999999
 * normalCdf(-3);                // 0.001349898031630048
 */
export function normalCdf(x: number): number {
  requireNumber('x', x);
  const z = -x / Math.SQRT2;
  return 0.5 * (z >= 0 ? erfcNonNegative(z) : 2 - erfcNonNegative(-z));
}
