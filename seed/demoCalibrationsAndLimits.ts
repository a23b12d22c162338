import type { Db } from '../db/Db.ts';
import type { Actor } from '../db/operations/Actor.ts';
import { recordCalibration } from '../db/operations/analysis/recordCalibration.ts';
import { setAcceptanceCriteria } from '../db/operations/analysis/setAcceptanceCriteria.ts';

const HOUR_MS = 3_600_000;

/**
 * The demo's own fringe-value calibrations (an epoxy disk at three loads, one polycarbonate
 * tension strip per lot) and the study's limits. All numbers are invented for the demo.
 */
export async function loadDemoCalibrationsAndLimits(db: Db, actor: Actor, batchIds: Map<string, string>, now: number) {
  const at = (daysAgo: number) => new Date(now - daysAgo * 24 * HOUR_MS).toISOString();
  const operator = 'M. Lindqvist';
  for (const [loadN, fringeOrder] of [[800, 3.72], [1200, 5.55], [1600, 7.43]] as const) {
    await recordCalibration(db, actor, batchIds.get('EP-CAST-03')!, {
      specimen: 'disk', loadN: { value: loadN, uncertainty: 4 }, diameterMm: { value: 50.02, uncertainty: 0.02 }, fringeOrder: { value: fringeOrder, uncertainty: 0.02 },
      wavelengthNm: 577, observedAt: at(8), operator, notes: 'disk DISK-E1, centre fringe by Tardy compensation',
    });
  }
  for (const [lot, fringeOrder] of [['PC-LOT-A', 7.1], ['PC-LOT-B', 7.3]] as const) {
    await recordCalibration(db, actor, batchIds.get(lot)!, {
      specimen: 'tension_strip', loadN: { value: 600, uncertainty: 3 }, widthMm: { value: 12.0, uncertainty: 0.02 }, fringeOrder: { value: fringeOrder, uncertainty: 0.02 },
      wavelengthNm: 577, observedAt: at(26), operator, notes: 'strip cut from the same sheet, gauge length away from the grips',
    });
  }
  await setAcceptanceCriteria(db, actor, {
    project: 'notch residual study',
    maxResidualFringeOrder: 0.2,
    maxResidualFractionOfTestOrder: 0.05,
    plannedLoadN: 600,
    coverageFactor: 2,
    reason: 'study plan: residual under 0.2 fringe and under 5 % of the test order at 600 N',
  });
}
