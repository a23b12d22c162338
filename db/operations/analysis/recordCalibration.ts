import { DomainError } from '../../../src/errors/DomainError.ts';
import { fringeValueFromBeam } from '../../../src/calibration/fringeValueFromBeam.ts';
import { fringeValueFromDisk } from '../../../src/calibration/fringeValueFromDisk.ts';
import { fringeValueFromTensionStrip } from '../../../src/calibration/fringeValueFromTensionStrip.ts';
import type { FringeValueCalibration } from '../../../src/calibration/FringeValueCalibration.ts';
import type { CreateCalibrationInput } from '../../inputs/analysis.ts';
import type { Db } from '../../Db.ts';
import { calibrations } from '../../schema/index.ts';
import type { Actor } from '../Actor.ts';
import { getBatch } from '../materials/getBatch.ts';

function calibrate(input: CreateCalibrationInput): FringeValueCalibration {
  const base = { fringeOrder: input.fringeOrder, wavelengthNm: input.wavelengthNm };
  if (input.specimen === 'disk') return fringeValueFromDisk({ ...base, loadN: input.loadN, diameterMm: input.diameterMm });
  if (input.specimen === 'tension_strip') return fringeValueFromTensionStrip({ ...base, loadN: input.loadN, widthMm: input.widthMm });
  return fringeValueFromBeam({ ...base, bendingMomentNmm: input.bendingMomentNmm, depthMm: input.depthMm });
}

/** Stores a batch calibration with the fringe value its specimen gives. */
export async function recordCalibration(db: Db, actor: Actor, batchId: string, input: CreateCalibrationInput) {
  const result = calibrate(input);
  if (!result.defined) {
    throw new DomainError('invalid_input', `This calibration gives no fringe value: ${result.reason}`, [{ field: 'fringeOrder', message: result.reason }]);
  }
  const { specimen, wavelengthNm, observedAt, operator, notes, ...raw } = input;
  return db.transaction(async (tx) => {
    await getBatch(tx, actor, batchId);
    const [row] = await tx
      .insert(calibrations)
      .values({
        labId: actor.labId,
        batchId,
        specimen,
        rawInputs: raw,
        wavelengthNm,
        fringeValueNPerMm: result.fringeValueNPerMm.value,
        fringeValueUncertaintyNPerMm: result.fringeValueNPerMm.uncertainty,
        observedAt: new Date(observedAt),
        operator,
        notes: notes ?? null,
        recordedByKeyId: actor.keyId,
      })
      .returning();
    return { ...row!, formula: result.formula };
  });
}
