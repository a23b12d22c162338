import type { Tristimulus } from './Illuminant.ts';

// Bradford cone-response matrix (Lam 1985, as used in CIECAM97s and ICC profiles) [from memory];
// the tests check the whole adaptation against culori's own D50 → D65 Bradford conversion.
const toCone = [
  [0.8951, 0.2664, -0.1614],
  [-0.7502, 1.7135, 0.0367],
  [0.0389, -0.0685, 1.0296],
] as const;

/** D65 white as culori (and CSS Color 4) define it: from chromaticity x = 0.3127, y = 0.3290. */
const d65White: Tristimulus = { x: 0.3127 / 0.329, y: 1, z: (1 - 0.3127 - 0.329) / 0.329 };

type Matrix = readonly (readonly number[])[];

const apply = (m: Matrix, v: readonly number[]): number[] =>
  m.map((row) => row[0]! * v[0]! + row[1]! * v[1]! + row[2]! * v[2]!);

const fromCone: Matrix = invert3(toCone);

function invert3(m: Matrix): number[][] {
  const [a, b, c] = m as [readonly number[], readonly number[], readonly number[]];
  const cof = (r1: readonly number[], r2: readonly number[]) => [
    r1[1]! * r2[2]! - r1[2]! * r2[1]!,
    r1[2]! * r2[0]! - r1[0]! * r2[2]!,
    r1[0]! * r2[1]! - r1[1]! * r2[0]!,
  ];
  const c0 = cof(b, c);
  const c1 = cof(c, a);
  const c2 = cof(a, b);
  const det = a[0]! * c0[0]! + a[1]! * c0[1]! + a[2]! * c0[2]!;
  return [0, 1, 2].map((i) => [c0[i]! / det, c1[i]! / det, c2[i]! / det]);
}

/**
 * Chromatic adaptation (Bradford, von Kries scaling in the Bradford cone space) of a colour seen
 * under a light whose white is `sourceWhite` to the corresponding colour under D65, so that the
 * source white itself lands exactly on D65 white. Models an observer (or a white-balanced
 * camera) adapted to the polariscope lamp.
 *
 * @example
 * bradfordAdaptToD65({ x: 1.0985, y: 1, z: 0.3558 }, { x: 1.0985, y: 1, z: 0.3558 });
 * // { x: 0.9505, y: 1, z: 1.0891 } (illuminant A's white becomes D65 white)
 */
export function bradfordAdaptToD65(colour: Tristimulus, sourceWhite: Tristimulus): Tristimulus {
  const source = apply(toCone, [sourceWhite.x, sourceWhite.y, sourceWhite.z]);
  const target = apply(toCone, [d65White.x, d65White.y, d65White.z]);
  const cone = apply(toCone, [colour.x, colour.y, colour.z]).map((v, i) => (v * target[i]!) / source[i]!);
  const [x, y, z] = apply(fromCone, cone) as [number, number, number];
  return { x, y, z };
}
