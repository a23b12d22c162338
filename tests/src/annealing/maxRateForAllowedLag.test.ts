import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { maxRateForAllowedLag } from '../../../src/annealing/maxRateForAllowedLag.ts';
import { rampLagC } from '../../../src/annealing/rampLagC.ts';

describe('maxRateForAllowedLag', () => {
  it('2 °C in 25 mm cast acrylic allows 10.05 °C/h [C, by hand: 2·0.109·2/12.5²·3600]', () => {
    expect(maxRateForAllowedLag({ allowedLagC: 2, halfThicknessMm: 12.5, diffusivityMm2PerS: 0.109 })).toBeCloseTo(10.045, 3);
  });

  it("the proposed rate's lag equals the allowed gradient (fast-check)", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.1, max: 20, noNaN: true }),
        fc.double({ min: 0.2, max: 60, noNaN: true }),
        fc.double({ min: 0.05, max: 1, noNaN: true }),
        (allowed, half, alpha) => {
          const rate = maxRateForAllowedLag({ allowedLagC: allowed, halfThicknessMm: half, diffusivityMm2PerS: alpha });
          expect(rampLagC({ rateCPerH: rate, halfThicknessMm: half, diffusivityMm2PerS: alpha })).toBeCloseTo(allowed, 9);
        },
      ),
    );
  });

  it('falls with the square of thickness (classical annealing theory) [C]', () => {
    const thin = maxRateForAllowedLag({ allowedLagC: 1, halfThicknessMm: 3, diffusivityMm2PerS: 0.43 });
    const thick = maxRateForAllowedLag({ allowedLagC: 1, halfThicknessMm: 6, diffusivityMm2PerS: 0.43 });
    expect(thin / thick).toBeCloseTo(4, 12);
  });
});
