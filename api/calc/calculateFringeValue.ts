import { fitFringeValueThroughOrigin, type FringeValueFit } from '../../src/calibration/fitFringeValueThroughOrigin.ts';
import type { Measured } from '../../src/uncertainty/Measured.ts';
import type { FringeValueCalcInput } from '../schemas/calcSchemas.ts';
import { calibrateSpecimen, type SpecimenCalibration } from './calibrateSpecimen.ts';

export interface FringeValueCalcResult {
  wavelengthNm: number;
  basis: 'single_specimen' | 'fit_through_origin';
  defined: boolean;
  fringeValueNPerMm?: Measured;
  reason?: string;
  points: SpecimenCalibration[];
  fit: FringeValueFit | null;
  notes: string[];
}

/**
 * POST /v1/calc/fringe-value: fσ from one calibration specimen (GUM propagation), or from
 * several load steps by least squares through the origin of q = fσ·N against N. Specimens of
 * different kinds may share one fit: fσ belongs to the material at that wavelength.
 *
 * @example
 * calculateFringeValue({ wavelengthNm: 577, points: [{ specimen: 'disk', loadN: { value: 1200, uncertainty: 6 },
 *   diameterMm: { value: 50, uncertainty: 0.02 }, fringeOrder: { value: 5.5, uncertainty: 0.02 } }] });
 * // basis 'single_specimen', fringeValueNPerMm { value: 11.112, uncertainty: 0.0688 }, wavelengthNm 577
 */
export function calculateFringeValue(input: FringeValueCalcInput): FringeValueCalcResult {
  const points = input.points.map((p) => calibrateSpecimen(p, input.wavelengthNm));
  const exactNote = (p: SpecimenCalibration, i: number) =>
    p.exactInputs.length > 0 ? [`points[${i}]: no uncertainty given for ${p.exactInputs.join(', ')}; taken as exact`] : [];
  const notes = [
    `fringe value at ${input.wavelengthNm} nm; convert to another wavelength in proportion to it (dispersion neglected)`,
    ...points.flatMap(exactNote),
  ];
  const [only] = points;
  if (points.length === 1 && only) {
    const c = only.calibration;
    return {
      wavelengthNm: input.wavelengthNm,
      basis: 'single_specimen',
      ...(c.defined ? { defined: true, fringeValueNPerMm: c.fringeValueNPerMm } : { defined: false, reason: c.reason }),
      points,
      fit: null,
      notes: [...(c.defined ? [c.formula] : []), ...notes],
    };
  }
  const fit = fitFringeValueThroughOrigin(
    points.map((p) => ({ fringeOrder: p.fringeOrder.value, stressLikeNPerMm: p.stressLikeNPerMm })),
    input.wavelengthNm,
  );
  return {
    wavelengthNm: input.wavelengthNm,
    basis: 'fit_through_origin',
    defined: true,
    fringeValueNPerMm: fit.fringeValueNPerMm,
    points,
    fit,
    notes: [
      'fσ = ΣNq/ΣN², q = fσ·N of each specimen; u(fσ) = s/√ΣN² from the scatter about the line, so the load and geometry uncertainties are not in it',
      `for an expanded interval use a Student t factor with ${fit.degreesOfFreedom} degrees of freedom`,
      ...notes,
    ],
  };
}
