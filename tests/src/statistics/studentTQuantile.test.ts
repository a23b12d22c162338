import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { DomainError } from '../../../src/errors/DomainError.ts';
import { studentTCdf } from '../../../src/statistics/studentTCdf.ts';
import { studentTQuantile } from '../../../src/statistics/studentTQuantile.ts';
import { jStat } from './jstatReference.ts';

const p = fc.double({ min: 1e-9, max: 1 - 1e-9, noNaN: true });

describe('studentTQuantile', () => {
  it('matches the closed forms for 1 and 2 degrees of freedom [C]', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.001, max: 0.999, noNaN: true }), (q) => {
        const cauchy = Math.tan(Math.PI * (q - 0.5));
        expect(Math.abs(studentTQuantile(q, 1) - cauchy)).toBeLessThan(1e-11 * Math.max(1, Math.abs(cauchy)));
        expect(studentTQuantile(q, 2)).toBeCloseTo((2 * q - 1) / Math.sqrt(2 * q * (1 - q)), 11);
      }),
    );
  });
  it('reproduces two-sided 95 % and 99 % table values [M: standard Student t table, 3 decimals]', () => {
    const table: [number, number, number][] = [
      [1, 0.975, 12.706], [2, 0.975, 4.303], [5, 0.975, 2.571], [10, 0.975, 2.228],
      [30, 0.975, 2.042], [10, 0.995, 3.169], [120, 0.975, 1.98],
    ];
    for (const [nu, q, expected] of table) expect(studentTQuantile(q, nu)).toBeCloseTo(expected, 3);
  });
  it('agrees with jstat.studentt.inv (reference library) to 1e-6 relative', () => {
    for (const nu of [0.7, 1, 3, 6.4, 15, 80, 1e3]) {
      for (const q of [1e-6, 0.001, 0.05, 0.3, 0.7, 0.95, 0.999]) {
        const reference = jStat.studentt.inv(q, nu);
        expect(Math.abs(studentTQuantile(q, nu) - reference)).toBeLessThan(1e-6 * Math.max(1, Math.abs(reference)));
      }
    }
  });
  it('inverts studentTCdf [C]', () => {
    fc.assert(
      fc.property(p, fc.double({ min: 0.5, max: 1e4, noNaN: true }), (q, nu) => {
        const back = studentTCdf(studentTQuantile(q, nu), nu);
        expect(Math.abs(back - q)).toBeLessThan(1e-11 * Math.min(q, 1 - q) + 1e-15);
      }),
    );
  });
  it('refuses p outside (0, 1)', () => {
    expect(() => studentTQuantile(0, 5)).toThrow(DomainError);
    expect(() => studentTQuantile(1, 5)).toThrow(DomainError);
    expect(studentTQuantile(0.5, 5)).toBe(0);
  });
});
