/** One input's share of a first-order (GUM) propagation: ∂f/∂x and u(x). */
export interface UncertaintyContribution {
  sensitivity: number;
  uncertainty: number;
}

/**
 * Combined standard uncertainty of a result from uncorrelated inputs, first order (GUM
 * eq. 10): u_c = √Σ (c_i·u_i)². Correlated inputs must be re-expressed in terms of
 * independent ones by the caller (or handled with a covariance term) before calling this.
 *
 * @example
 * // σ = N·fσ/t with N = 2.5 ± 0.02, fσ = 7.0 ± 0.2 N/mm, t = 6.0 ± 0.05 mm
 * combinedStandardUncertainty([
 *   { sensitivity: 7.0 / 6.0, uncertainty: 0.02 },
 *   { sensitivity: 2.5 / 6.0, uncertainty: 0.2 },
 *   { sensitivity: -2.5 * 7.0 / 36, uncertainty: 0.05 },
 * ]); // ≈ 0.0899 MPa
 */
export function combinedStandardUncertainty(contributions: readonly UncertaintyContribution[]): number {
  // hypot avoids overflow/underflow that squaring tiny or huge terms by hand would cause.
  return Math.hypot(...contributions.map((c) => c.sensitivity * c.uncertainty));
}
