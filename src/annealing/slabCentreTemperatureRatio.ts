import { requireNumber } from '../guards/requireNumber.ts';
import { slabEigenvalue } from './slabEigenvalue.ts';
import { slabOneTermCoefficient } from './slabOneTermCoefficient.ts';

export interface SlabCentreRatio {
  /** θ0* = (T_centre − T_oven) / (T_initial − T_oven). */
  ratio: number;
  /** The one-term form is accurate to about 2 % only for Fo > 0.2; below it it overestimates θ0*. */
  oneTermValid: boolean;
}

/**
 * Centre temperature ratio of a slab after a step change of its surroundings, one-term
 * solution θ0* = C1·exp(−ζ1²·Fo), with Fo = α·t/L².
 *
 * @example
 * slabCentreTemperatureRatio({ biot: Infinity, fourier: 0.5 });
 * // { ratio: 0.3708, oneTermValid: true }   (1.2732·exp(−2.4674·0.5))
 */
export function slabCentreTemperatureRatio(input: { biot: number; fourier: number }): SlabCentreRatio {
  const fourier = requireNumber('fourier', input.fourier, { min: 0 });
  const z = slabEigenvalue(input.biot);
  return {
    ratio: slabOneTermCoefficient(input.biot) * Math.exp(-z * z * fourier),
    oneTermValid: fourier > 0.2,
  };
}
