import { slabEigenvalue } from './slabEigenvalue.ts';

/**
 * Coefficient C1 of the one-term slab solution, C1 = 4 sin ζ1 / (2ζ1 + sin 2ζ1), for a slab
 * starting at a uniform temperature.
 *
 * @example
 * slabOneTermCoefficient(1);        // 1.1191 (to four digits)
 * slabOneTermCoefficient(Infinity); // 1.2732 (= 4/π)
 */
export function slabOneTermCoefficient(biot: number): number {
  const z = slabEigenvalue(biot);
  return (4 * Math.sin(z)) / (2 * z + Math.sin(2 * z));
}
