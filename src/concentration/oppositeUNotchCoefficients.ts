// Curve-fit coefficients for opposite U-notches in a finite-width thin element in tension,
// Kt on the net section: Kt = C1 + C2·(2h/D) + C3·(2h/D)² + C4·(2h/D)³, each
// Ci = a + b·√(h/r) + c·(h/r). [M: recalled from memory of Pilkey, Peterson's Stress
// Concentration Factors, chart for opposite U-shaped notches in tension; not re-read.]

/** [a, b, c] of one coefficient Ci = a + b·√(h/r) + c·(h/r). */
export type CoefficientTerms = readonly [number, number, number];

export interface OppositeUNotchFitBranch {
  /** Inclusive lower and upper limit of h/r (the upper one exclusive where another branch starts). */
  minDepthToRadius: number;
  maxDepthToRadius: number;
  upperExclusive: boolean;
  c: readonly [CoefficientTerms, CoefficientTerms, CoefficientTerms, CoefficientTerms];
}

export const OPPOSITE_U_NOTCH_FIT: readonly OppositeUNotchFitBranch[] = [
  {
    minDepthToRadius: 0.1,
    maxDepthToRadius: 2.0,
    upperExclusive: true,
    c: [
      [0.955, 2.169, -0.081],
      [-1.557, -4.046, 1.032],
      [4.013, 0.424, -0.748],
      [-2.461, 1.538, -0.236],
    ],
  },
  {
    minDepthToRadius: 2.0,
    maxDepthToRadius: 50,
    upperExclusive: false,
    c: [
      [1.037, 1.991, 0.002],
      [-1.886, -2.181, -0.048],
      [0.649, 1.086, 0.142],
      [1.218, -0.922, -0.086],
    ],
  },
];

export const OPPOSITE_U_NOTCH_SOURCE =
  'curve fit for opposite U-notches in tension, net section (Pilkey, Peterson’s Stress Concentration Factors) — coefficients from memory [M], not re-read';
