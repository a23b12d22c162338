import { DomainError } from '../errors/DomainError.ts';
import type { FieldProblem } from '../errors/DomainError.ts';
import type { MeasuredLampSpectrum } from './Illuminant.ts';

const requiredFromNm = 400;
const requiredToNm = 700;

/**
 * Validates a measured lamp spectrum and resamples it by linear interpolation at the given
 * wavelengths. Outside the measured range the power is taken as 0: a lamp is not credited with
 * light nobody measured (the range 400–700 nm that must be covered carries over 99 % of the
 * CIE 1931 ȳ weight).
 *
 * @example
 * resampleLampSpectrum({ wavelengthNm: [380, 500, 780], relativePower: [10, 50, 90] }, [440, 640]);
 * // [30, 70]
 */
export function resampleLampSpectrum(lamp: MeasuredLampSpectrum, atWavelengthNm: readonly number[]): number[] {
  const problems = lampSpectrumProblems(lamp);
  if (problems.length > 0) throw new DomainError('invalid_input', 'measured lamp spectrum is not usable', problems);
  const w = lamp.wavelengthNm;
  const p = lamp.relativePower;
  const last = w.length - 1;
  let j = 0;
  return atWavelengthNm.map((lambda) => {
    if (lambda < w[0]! || lambda > w[last]!) return 0;
    while (j < last - 1 && w[j + 1]! < lambda) j += 1;
    while (j > 0 && w[j]! > lambda) j -= 1;
    const t = (lambda - w[j]!) / (w[j + 1]! - w[j]!);
    return p[j]! + t * (p[j + 1]! - p[j]!);
  });
}

function lampSpectrumProblems(lamp: MeasuredLampSpectrum): FieldProblem[] {
  const w = lamp?.wavelengthNm;
  const p = lamp?.relativePower;
  if (!Array.isArray(w) || !Array.isArray(p)) {
    return [{ field: 'illuminant', message: 'needs arrays wavelengthNm and relativePower' }];
  }
  if (w.length !== p.length) {
    return [{ field: 'illuminant.relativePower', message: `has ${p.length} values for ${w.length} wavelengths` }];
  }
  if (w.length < 2) return [{ field: 'illuminant.wavelengthNm', message: 'needs at least 2 points' }];
  const problems: FieldProblem[] = [];
  w.forEach((lambda, i) => {
    if (typeof lambda !== 'number' || !Number.isFinite(lambda) || lambda <= 0) {
      problems.push({ field: `illuminant.wavelengthNm/${i}`, message: `must be a positive finite number, got ${String(lambda)}` });
    } else if (i > 0 && !(lambda > w[i - 1]!)) {
      problems.push({ field: `illuminant.wavelengthNm/${i}`, message: `must be greater than the previous wavelength ${w[i - 1]}` });
    }
  });
  p.forEach((power, i) => {
    if (typeof power !== 'number' || !Number.isFinite(power) || power < 0) {
      problems.push({ field: `illuminant.relativePower/${i}`, message: `must be a non-negative finite number, got ${String(power)}` });
    }
  });
  if (problems.length > 0) return problems;
  if (w[0]! > requiredFromNm || w[w.length - 1]! < requiredToNm) {
    problems.push({ field: 'illuminant.wavelengthNm', message: `must cover ${requiredFromNm}–${requiredToNm} nm, covers ${w[0]}–${w[w.length - 1]} nm` });
  }
  if (!p.some((power) => power > 0)) problems.push({ field: 'illuminant.relativePower', message: 'is zero everywhere' });
  return problems;
}
