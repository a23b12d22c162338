import { COMMON_PRACTICE_FITNESS_CRITERIA } from '../../../src/acceptance/commonPracticeFitnessCriteria.ts';
import { assessSiteResidual } from '../../../src/acceptance/assessSiteResidual.ts';
import type { FitnessCriteria } from '../../../src/acceptance/FitnessTypes.ts';
import { fringeValueForBatch } from '../../../src/calibration/fringeValueForBatch.ts';
import { resolveWavelengthNm } from '../../../src/optics/resolveWavelengthNm.ts';
import type { CriteriaRow } from './criteriaInForceFor.ts';
import type { AnalysisInputs } from './readAnalysisInputs.ts';

const RANK = { needs_annealing: 3, undecided: 2, conforming: 1, no_readings: 0 } as const;

function limitsOf(row: CriteriaRow | null) {
  if (!row) return { source: 'common_practice' as const, flag: COMMON_PRACTICE_FITNESS_CRITERIA.flag, criteria: { ...COMMON_PRACTICE_FITNESS_CRITERIA.usual } as FitnessCriteria, coverageFactor: 2, plannedLoadN: null, criteriaId: null };
  const criteria: FitnessCriteria = {};
  if (row.maxResidualFringeOrder !== null) criteria.maxResidualFringeOrder = row.maxResidualFringeOrder;
  if (row.maxResidualStressMPa !== null) criteria.maxResidualStressMPa = row.maxResidualStressMPa;
  if (row.maxResidualFractionOfTestOrder !== null) criteria.maxResidualFractionOfTestOrder = row.maxResidualFractionOfTestOrder;
  return { source: row.modelId ? ('model' as const) : ('project' as const), flag: null, criteria, coverageFactor: row.coverageFactor, plannedLoadN: row.plannedLoadN, criteriaId: row.id };
}

/**
 * The residual analysis of one model from what readAnalysisInputs read: the fringe value in use,
 * the limits in force, and per site every stage quantity, Kt and the fitness decision; the
 * model's decision is its worst site's.
 */
export function composeResidualAnalysis({ model, material, sites, readings: siteReadings, calibrations: batchCalibrations, criteria }: AnalysisInputs) {
  const referenceWavelengthNm = material.fringeValueWavelengthNm;
  const fringeValue = fringeValueForBatch(
    batchCalibrations.map((c) => ({ fringeOrder: (c.rawInputs as { fringeOrder: { value: number } }).fringeOrder.value, fringeValueNPerMm: { value: c.fringeValueNPerMm, uncertainty: c.fringeValueUncertaintyNPerMm }, wavelengthNm: c.wavelengthNm })),
    { fringeValueNPerMm: { value: material.fringeValueNPerMm, uncertainty: material.fringeValueUncertaintyNPerMm }, wavelengthNm: material.fringeValueWavelengthNm },
    referenceWavelengthNm,
  );
  const limits = limitsOf(criteria);
  const siteResults = sites.map((site) => {
    const thicknessMm = { value: site.localThicknessMm ?? model.thicknessMm, uncertainty: model.thicknessUncertaintyMm };
    const assessment = assessSiteResidual({
      readings: siteReadings.filter((r) => r.siteId === site.id).map((r) => ({ ...r, wavelengthNm: resolveWavelengthNm({ wavelengthNm: r.wavelengthNm }) })),
      fringeValueNPerMm: fringeValue.fringeValueNPerMm,
      referenceWavelengthNm,
      thicknessMm,
      onFreeEdge: site.onFreeEdge,
      geometry: model,
      criteria: limits.criteria,
      coverageFactor: limits.coverageFactor,
      plannedLoadN: limits.plannedLoadN,
    });
    return { siteId: site.id, label: site.label, kind: site.kind, onFreeEdge: site.onFreeEdge, thicknessMm, ...assessment };
  });
  const worst = siteResults.reduce<keyof typeof RANK>((w, s) => (RANK[s.decision] > RANK[w] ? s.decision : w), 'no_readings');
  return {
    model: { id: model.id, code: model.code, geometryKind: model.geometryKind, thicknessMm: model.thicknessMm, batchId: model.batchId, materialName: material.name },
    fringeValue,
    limits,
    decision: worst,
    sites: siteResults,
    notes: [
      `fringe orders are expressed at ${referenceWavelengthNm} nm, the wavelength of the fringe value in use`,
      'the model\'s decision is that of its worst site; a site is judged on its latest reading taken without load',
    ],
  };
}
