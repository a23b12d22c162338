import { ktOppositeUNotchesFiniteStrip, type HandbookKt } from '../concentration/ktOppositeUNotchesFiniteStrip.ts';
import { measuredStressConcentrationFromOrder } from '../concentration/measuredStressConcentrationFromOrder.ts';
import { analyseSiteStages } from '../residual/analyseSiteStages.ts';
import type { SiteStagesAnalysis, StressFromOrder } from '../residual/SiteStagesTypes.ts';
import { stageInputsFromReadings, type RecordedReading, type RecordedStage } from '../residual/stageInputsFromReadings.ts';
import { stressFromOrder } from '../residual/stressFromOrder.ts';
import type { Measured } from '../uncertainty/Measured.ts';
import { assessFitnessToTest } from './assessFitnessToTest.ts';
import { estimateTestFringeOrder, type TestFringeOrderEstimate } from './estimateTestFringeOrder.ts';
import type { FitnessAssessment, FitnessCriteria } from './FitnessTypes.ts';

export interface SiteGeometry {
  geometryKind: string;
  grossWidthMm: number | null;
  netWidthMm: number | null;
  notchDepthMm: number | null;
  notchRootRadiusMm: number | null;
}

export interface SiteResidualInput {
  readings: readonly RecordedReading[];
  fringeValueNPerMm: Measured;
  referenceWavelengthNm: number;
  thicknessMm: Measured;
  onFreeEdge: boolean;
  geometry: SiteGeometry;
  criteria: FitnessCriteria;
  coverageFactor: number;
  plannedLoadN: number | null;
}

export interface SiteResidualAssessment {
  readingIds: Partial<Record<string, string>>;
  analysis: SiteStagesAnalysis | null;
  current: { readingId: string; stage: RecordedStage; observedAt: Date; order: Measured; stress: StressFromOrder } | null;
  stressConcentration: { measured: ReturnType<typeof measuredStressConcentrationFromOrder> | null; handbook: (HandbookKt & { available: true }) | { available: false; reason: string } };
  testFringeOrder: (TestFringeOrderEstimate & { ktSource: 'measured' | 'handbook' }) | null;
  fitness: FitnessAssessment | null;
  decision: FitnessAssessment['decision'] | 'no_readings';
  notes: string[];
}

const U_NOTCH_KINDS = new Set(['opposite_rounded_notches', 'opposite_sharp_sawn_notches']);

function handbookKt(g: SiteGeometry): SiteResidualAssessment['stressConcentration']['handbook'] {
  if (!U_NOTCH_KINDS.has(g.geometryKind)) return { available: false, reason: `no handbook fit held for geometry ${g.geometryKind}` };
  if (!g.notchDepthMm || !g.notchRootRadiusMm || !g.grossWidthMm) return { available: false, reason: 'notch depth, root radius and gross width are needed' };
  try {
    return { available: true, ...ktOppositeUNotchesFiniteStrip(g.notchDepthMm, g.notchRootRadiusMm, g.grossWidthMm) };
  } catch (error) {
    return { available: false, reason: (error as Error).message };
  }
}

/**
 * Everything the lab needs to know about one site: the stage analysis, what the model
 * carries now (the latest unloaded reading), measured and handbook Kt, the fringe order the
 * planned test will produce, and fitness to test against the limits in force.
 *
 * @example
 * // fabrication 0.10 ± 0.01 fringe on a 6 mm polycarbonate model (fσ 7.0 ± 0.5 N/mm),
 * // limit 0.2 fringe → decision 'conforming' (0.10 + 2·0.01 ≤ 0.2)
 */
export function assessSiteResidual(input: SiteResidualInput): SiteResidualAssessment {
  const staged = stageInputsFromReadings(input.readings, input.referenceWavelengthNm);
  const notes: string[] = [];
  const hasStage = Object.keys(staged.stages).length > 0;
  const analysis = hasStage
    ? analyseSiteStages({ ...staged.stages, fringeValueNPerMm: input.fringeValueNPerMm, thicknessMm: input.thicknessMm, onFreeEdge: input.onFreeEdge })
    : null;
  const current = staged.current
    ? { readingId: staged.current.readingId, stage: staged.current.stage, observedAt: staged.current.observedAt, order: staged.current.reading.order, stress: stressFromOrder(staged.current.reading.order, input.fringeValueNPerMm, input.thicknessMm, input.onFreeEdge) }
    : null;

  const loadCorrected = analysis?.loadCorrected;
  const measured = loadCorrected && input.geometry.netWidthMm
    ? measuredStressConcentrationFromOrder(
        { value: Math.abs(loadCorrected.order.value), uncertainty: loadCorrected.order.uncertainty },
        input.fringeValueNPerMm,
        { value: loadCorrected.loadN, uncertainty: 0 },
        { value: input.geometry.netWidthMm, uncertainty: 0 },
      )
    : null;
  const handbook = handbookKt(input.geometry);

  const kt = measured?.defined ? { kt: measured.kt, ktSource: 'measured' as const } : handbook.available ? { kt: { value: handbook.ktNetSection, uncertainty: 0 }, ktSource: 'handbook' as const } : null;
  const testFringeOrder = input.plannedLoadN && input.geometry.netWidthMm && kt
    ? { ...estimateTestFringeOrder({ plannedLoadN: input.plannedLoadN, netWidthMm: input.geometry.netWidthMm, thicknessMm: input.thicknessMm, kt: kt.kt, fringeValueNPerMm: input.fringeValueNPerMm }), ktSource: kt.ktSource }
    : null;

  const criteria: FitnessCriteria = { ...input.criteria };
  if (criteria.maxResidualFractionOfTestOrder !== undefined && !testFringeOrder) {
    delete criteria.maxResidualFractionOfTestOrder;
    notes.push('fraction-of-test-order limit not judged: it needs a planned load, the net width and a Kt (measured or handbook)');
  }
  if (!current) return { readingIds: staged.readingIds, analysis, current, stressConcentration: { measured, handbook }, testFringeOrder, fitness: null, decision: 'no_readings', notes: [...notes, 'no reading without load at this site yet'] };
  if (Object.keys(criteria).length === 0) {
    return { readingIds: staged.readingIds, analysis, current, stressConcentration: { measured, handbook }, testFringeOrder, fitness: null, decision: 'undecided', notes: [...notes, 'no limit left to judge against'] };
  }
  const fitness = assessFitnessToTest({
    residualOrder: current.order,
    residualStressMPa: current.stress.stressMPa,
    ...(testFringeOrder ? { testFringeOrder: testFringeOrder.testFringeOrder } : {}),
    criteria,
    coverageFactor: input.coverageFactor,
  });
  return { readingIds: staged.readingIds, analysis, current, stressConcentration: { measured, handbook }, testFringeOrder, fitness, decision: fitness.decision, notes };
}
