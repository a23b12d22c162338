import { requireNumber } from '../guards/requireNumber.ts';
import { cie1931StandardObserver5Nm } from './data/cie1931StandardObserver5Nm.ts';
import type { IlluminantSpec, Tristimulus } from './Illuminant.ts';
import { illuminantPowerOnObserverGrid } from './illuminantPowerOnObserverGrid.ts';

const { startNm, stepNm, xBar, yBar, zBar } = cie1931StandardObserver5Nm;

/**
 * Tristimulus values of the light leaving a dark-field circular polariscope at retardation δ:
 * each wavelength is transmitted as sin²(πδ/λ), so X = Σ S(λ)·sin²(πδ/λ)·x̄(λ) / Σ S(λ)·ȳ(λ)
 * (likewise Y, Z) over 380–780 nm in 5 nm steps. Normalisation: the illuminant passing
 * unattenuated (transmission 1 at every wavelength) has Y = 1, so high orders, where sin²
 * averages to ½, tend to a grey of Y = 0.5. δ is taken as the same at all wavelengths
 * (dispersion of birefringence neglected).
 *
 * @example
 * xyzAtRetardation(0, 'D65');   // { x: 0, y: 0, z: 0 }
 * xyzAtRetardation(260, 'D65'); // { x: 0.9062, y: 0.9789, z: 1.0259 } (first-order white)
 */
export function xyzAtRetardation(retardationNm: number, illuminant: IlluminantSpec): Tristimulus {
  const delta = requireNumber('retardationNm', retardationNm, { min: 0 });
  const power = illuminantPowerOnObserverGrid(illuminant);
  let x = 0;
  let y = 0;
  let z = 0;
  let whiteY = 0;
  power.forEach((s, i) => {
    const lambda = startNm + i * stepNm;
    const t = Math.sin((Math.PI * delta) / lambda) ** 2;
    x += s * t * xBar[i]!;
    y += s * t * yBar[i]!;
    z += s * t * zBar[i]!;
    whiteY += s * yBar[i]!;
  });
  return { x: x / whiteY, y: y / whiteY, z: z / whiteY };
}
