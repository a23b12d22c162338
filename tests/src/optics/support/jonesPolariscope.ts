// Test-only reference: a Jones-calculus polariscope [C, standard polarisation optics], so the
// Tardy and Sénarmont formulas are checked against light propagated through the optical
// elements rather than against the formulas themselves.

type Complex = { re: number; im: number };
type Vector = [Complex, Complex];
type Matrix = [[Complex, Complex], [Complex, Complex]];

const c = (re: number, im = 0): Complex => ({ re, im });
const mul = (a: Complex, b: Complex): Complex => c(a.re * b.re - a.im * b.im, a.re * b.im + a.im * b.re);
const add = (a: Complex, b: Complex): Complex => c(a.re + b.re, a.im + b.im);
const apply = (m: Matrix, v: Vector): Vector => [
  add(mul(m[0][0], v[0]), mul(m[0][1], v[1])),
  add(mul(m[1][0], v[0]), mul(m[1][1], v[1])),
];

/** Linear retarder with its fast axis at `axisRad` and phase `phaseRad`: R(θ)·diag(e^{−iΓ/2}, e^{iΓ/2})·R(−θ). */
export function retarder(axisRad: number, phaseRad: number): Matrix {
  const [co, s] = [Math.cos(axisRad), Math.sin(axisRad)];
  const p = c(Math.cos(phaseRad / 2), -Math.sin(phaseRad / 2));
  const q = c(Math.cos(phaseRad / 2), Math.sin(phaseRad / 2));
  const scale = (z: Complex, k: number) => c(z.re * k, z.im * k);
  return [
    [add(scale(p, co * co), scale(q, s * s)), add(scale(p, co * s), scale(q, -co * s))],
    [add(scale(p, co * s), scale(q, -co * s)), add(scale(p, s * s), scale(q, co * co))],
  ];
}

/** Intensity behind an analyzer at `analyzerRad`, for light polarised along x entering `elements` in order. */
export function intensityBehindAnalyzer(elements: readonly Matrix[], analyzerRad: number): number {
  let e: Vector = [c(1), c(0)];
  for (const m of elements) e = apply(m, e);
  const out = add(mul(c(Math.cos(analyzerRad)), e[0]), mul(c(Math.sin(analyzerRad)), e[1]));
  return out.re * out.re + out.im * out.im;
}

const deg = Math.PI / 180;

/**
 * Tardy arrangement: polarizer (x) along a principal direction of the specimen, quarter-wave
 * plates at +45° and −45° around it, analyzer at 90° + rotation (dark field at rotation 0).
 */
export function tardyIntensity(fringeOrder: number, analyzerRotationDeg: number): number {
  const elements = [retarder(45 * deg, Math.PI / 2), retarder(0, 2 * Math.PI * fringeOrder), retarder(-45 * deg, Math.PI / 2)];
  return intensityBehindAnalyzer(elements, (90 + analyzerRotationDeg) * deg);
}

/** Sénarmont arrangement: specimen axes at 45° to the polarizer, a quarter-wave plate along the polarizer, analyzer at 90° + rotation. */
export function senarmontIntensity(fringeOrder: number, analyzerRotationDeg: number): number {
  const elements = [retarder(45 * deg, 2 * Math.PI * fringeOrder), retarder(0, Math.PI / 2)];
  return intensityBehindAnalyzer(elements, (90 + analyzerRotationDeg) * deg);
}
