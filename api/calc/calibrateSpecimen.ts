import { fringeValueFromBeam } from '../../src/calibration/fringeValueFromBeam.ts';
import { fringeValueFromDisk } from '../../src/calibration/fringeValueFromDisk.ts';
import { fringeValueFromTensionStrip } from '../../src/calibration/fringeValueFromTensionStrip.ts';
import type { FringeValueCalibration } from '../../src/calibration/FringeValueCalibration.ts';
import type { Measured } from '../../src/uncertainty/Measured.ts';
import type { CalibrationSpecimen } from '../schemas/calcSchemas.ts';

export interface SpecimenCalibration {
  specimen: CalibrationSpecimen['specimen'];
  fringeOrder: Measured;
  /** q = fσ·N of the specimen, N/mm: the ordinate of a fit through the origin. */
  stressLikeNPerMm: number;
  calibration: FringeValueCalibration;
  /** Inputs given without an uncertainty, taken as exact. */
  exactInputs: string[];
}

type Given = { value: number; uncertainty?: number | undefined };

/**
 * One calibration specimen through its src/calibration formula, with GUM propagation.
 *
 * @example
 * calibrateSpecimen({ specimen: 'tension_strip', loadN: { value: 72 }, widthMm: { value: 10 }, fringeOrder: { value: 1 } }, 577);
 * // { specimen: 'tension_strip', stressLikeNPerMm: 7.2, fringeOrder: { value: 1, uncertainty: 0 },
 * //   calibration: { defined: true, fringeValueNPerMm: { value: 7.2, uncertainty: 0 }, ... },
 * //   exactInputs: ['loadN', 'widthMm', 'fringeOrder'] }
 */
export function calibrateSpecimen(specimen: CalibrationSpecimen, wavelengthNm: number): SpecimenCalibration {
  const exactInputs: string[] = [];
  const m = (field: string, g: Given): Measured => {
    if (g.uncertainty === undefined) exactInputs.push(field);
    return { value: g.value, uncertainty: g.uncertainty ?? 0 };
  };
  const run = formulaOf(specimen, m, wavelengthNm);
  const fringeOrder = m('fringeOrder', specimen.fringeOrder);
  const calibration = run(fringeOrder);
  // fσ = q/N, so each geometry's own formula at N = 1 exactly is q: the formulas stay in src/ only.
  const atUnitOrder = run({ value: 1, uncertainty: 0 });
  if (!atUnitOrder.defined) throw new Error(`calibration at N = 1 came back undefined: ${atUnitOrder.reason}`);
  return { specimen: specimen.specimen, fringeOrder, stressLikeNPerMm: atUnitOrder.fringeValueNPerMm.value, calibration, exactInputs };
}

function formulaOf(specimen: CalibrationSpecimen, m: (field: string, g: Given) => Measured, wavelengthNm: number): (fringeOrder: Measured) => FringeValueCalibration {
  switch (specimen.specimen) {
    case 'disk': {
      const loadN = m('loadN', specimen.loadN);
      const diameterMm = m('diameterMm', specimen.diameterMm);
      return (fringeOrder) => fringeValueFromDisk({ loadN, diameterMm, fringeOrder, wavelengthNm });
    }
    case 'tension_strip': {
      const loadN = m('loadN', specimen.loadN);
      const widthMm = m('widthMm', specimen.widthMm);
      return (fringeOrder) => fringeValueFromTensionStrip({ loadN, widthMm, fringeOrder, wavelengthNm });
    }
    case 'beam': {
      const bendingMomentNmm = m('bendingMomentNmm', specimen.bendingMomentNmm);
      const depthMm = m('depthMm', specimen.depthMm);
      return (fringeOrder) => fringeValueFromBeam({ bendingMomentNmm, depthMm, fringeOrder, wavelengthNm });
    }
  }
}
