// Test-only reference: the closed-form elastic stress field of a disk of diameter D and
// thickness t under diametral compression P along y, built from two Flamant point loads and
// a uniform tension 2P/(πDt) [M: Timoshenko & Goodier, Theory of Elasticity; Frocht,
// Photoelasticity]. The tests check it is traction-free on the rim before trusting it.

export interface PlaneStress {
  sigmaXMPa: number;
  sigmaYMPa: number;
  tauXYMPa: number;
}

export function diskStress(loadN: number, diameterMm: number, thicknessMm: number, xMm: number, yMm: number): PlaneStress {
  const r = diameterMm / 2;
  const k = (2 * loadN) / (Math.PI * thicknessMm);
  const a = r - yMm;
  const b = r + yMm;
  const r1Sq = xMm * xMm + a * a;
  const r2Sq = xMm * xMm + b * b;
  return {
    sigmaXMPa: -k * ((a * xMm * xMm) / r1Sq ** 2 + (b * xMm * xMm) / r2Sq ** 2 - 1 / diameterMm),
    sigmaYMPa: -k * (a ** 3 / r1Sq ** 2 + b ** 3 / r2Sq ** 2 - 1 / diameterMm),
    tauXYMPa: k * ((a * a * xMm) / r1Sq ** 2 - (b * b * xMm) / r2Sq ** 2),
  };
}

/** σ1 − σ2 from Mohr's circle. */
export function principalDifferenceMPa(s: PlaneStress): number {
  return Math.hypot(s.sigmaXMPa - s.sigmaYMPa, 2 * s.tauXYMPa);
}
