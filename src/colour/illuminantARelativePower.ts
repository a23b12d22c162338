import { requireNumber } from '../guards/requireNumber.ts';

// CIE 015 keeps c2 = 1.435e7 nm·K with T = 2848 K so that the defining ratio c2/T stays what it
// was when A was standardised; with today's c2 = 1.4388e7 nm·K that is a 2856 K Planckian radiator.
const c2NmK = 1.435e7;
const temperatureK = 2848;

/**
 * Relative spectral power of CIE standard illuminant A from its closed Planckian form
 * (CIE 015): S_A(λ) = 100·(560/λ)⁵·[exp(c2/(560·T)) − 1] / [exp(c2/(λ·T)) − 1], normalised to
 * 100 at 560 nm.
 *
 * @example
 * illuminantARelativePower(560); // 100
 * illuminantARelativePower(400); // 14.708
 * illuminantARelativePower(700); // 198.261
 */
export function illuminantARelativePower(wavelengthNm: number): number {
  const lambda = requireNumber('wavelengthNm', wavelengthNm, { above: 0 });
  return (
    (100 * Math.pow(560 / lambda, 5) * Math.expm1(c2NmK / (560 * temperatureK))) /
    Math.expm1(c2NmK / (lambda * temperatureK))
  );
}
