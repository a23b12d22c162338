import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { DomainError } from '../../../src/errors/DomainError.ts';
import { slabEigenvalue } from '../../../src/annealing/slabEigenvalue.ts';

// Incropera, Fundamentals of Heat and Mass Transfer, Table 5.1 (plane wall, first eigenvalue),
// as listed in the project reference sheet [C, agrees with the table].
const TABLE_5_1: [number, number][] = [
  [0.01, 0.0998],
  [0.1, 0.3111],
  [1, 0.8603],
  [10, 1.4289],
  [Number.POSITIVE_INFINITY, 1.5708],
];

describe('slabEigenvalue', () => {
  it.each(TABLE_5_1)('Bi %s gives ζ1 %s to four digits (Incropera Table 5.1)', (biot, zeta) => {
    expect(slabEigenvalue(biot)).toBeCloseTo(zeta, 4);
  });

  it('satisfies ζ·tan ζ = Bi and stays inside (0, π/2) from tiny to huge Bi (fast-check)', () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-9, max: 1e9, noNaN: true }), (biot) => {
        const z = slabEigenvalue(biot);
        expect(z).toBeGreaterThan(0);
        expect(z).toBeLessThan(Math.PI / 2);
        expect(Math.abs(z * Math.tan(z) - biot) / biot).toBeLessThan(1e-6);
      }),
    );
  });

  it('rises with Bi (fast-check)', () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-6, max: 1e6, noNaN: true }), fc.double({ min: 1.01, max: 100, noNaN: true }), (biot, factor) => {
        expect(slabEigenvalue(biot * factor)).toBeGreaterThan(slabEigenvalue(biot));
      }),
    );
  });

  it('matches the small-Bi limit ζ1 ≈ √Bi [C, series of tan]', () => {
    expect(slabEigenvalue(1e-8)).toBeCloseTo(1e-4, 10);
  });

  it.each([0, -1, Number.NaN])('refuses Bi = %s', (biot) => {
    expect(() => slabEigenvalue(biot)).toThrow(DomainError);
  });
});
