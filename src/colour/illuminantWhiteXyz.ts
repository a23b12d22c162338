import { cie1931StandardObserver5Nm } from './data/cie1931StandardObserver5Nm.ts';
import type { IlluminantSpec, Tristimulus } from './Illuminant.ts';
import { illuminantPowerOnObserverGrid } from './illuminantPowerOnObserverGrid.ts';

const { xBar, yBar, zBar } = cie1931StandardObserver5Nm;

/**
 * Tristimulus values of the illuminant itself (full transmission), scaled to Y = 1 — the
 * reference white of the normalisation used by `xyzAtRetardation`.
 *
 * @example
 * illuminantWhiteXyz('D65'); // { x: 0.9504, y: 1, z: 1.0888 }
 * illuminantWhiteXyz('A');   // { x: 1.0985, y: 1, z: 0.3558 }
 */
export function illuminantWhiteXyz(illuminant: IlluminantSpec): Tristimulus {
  const power = illuminantPowerOnObserverGrid(illuminant);
  let x = 0;
  let y = 0;
  let z = 0;
  power.forEach((s, i) => {
    x += s * xBar[i]!;
    y += s * yBar[i]!;
    z += s * zBar[i]!;
  });
  return { x: x / y, y: 1, z: z / y };
}
