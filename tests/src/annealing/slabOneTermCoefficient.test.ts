import { describe, expect, it } from 'vitest';
import { slabOneTermCoefficient } from '../../../src/annealing/slabOneTermCoefficient.ts';

// Incropera, Fundamentals of Heat and Mass Transfer, Table 5.1 (plane wall, C1), as listed in
// the project reference sheet [C, agrees with the table].
describe('slabOneTermCoefficient', () => {
  it.each([
    [0.01, 1.0017],
    [0.1, 1.0161],
    [1, 1.1191],
    [10, 1.262],
    [Number.POSITIVE_INFINITY, 1.2732],
  ])('Bi %s gives C1 %s to four digits (Incropera Table 5.1)', (biot, c1) => {
    expect(slabOneTermCoefficient(biot)).toBeCloseTo(c1, 4);
  });

  it('is 4/π for a surface held at the oven temperature [C, Fourier series of a uniform start]', () => {
    expect(slabOneTermCoefficient(Number.POSITIVE_INFINITY)).toBeCloseTo(4 / Math.PI, 12);
  });
});
