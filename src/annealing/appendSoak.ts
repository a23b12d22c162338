import type { SourceRef } from './AnnealingGuidance.ts';
import type { PlanDraft } from './PlanDraft.ts';
import { addSources } from './addSources.ts';
import { timeForCentreWithinTolerance } from './timeForCentreWithinTolerance.ts';

/**
 * Adds a soak at the draft's current temperature. The soak lasts the rule's time, or longer
 * when the centre needs longer to come within the soak tolerance after the preceding ramp
 * (one-term slab solution); a zero-length soak adds no segment but is still checked.
 *
 * @example
 * appendSoak(draft, { rule: { durationH: 12, maximumH: null, sources: [] }, label: 'soak' });
 * // draft at 80 °C after a 14 °C/h ramp, 12 mm acrylic: adds { kind: 'soak', 80 °C, durationH: 12 }
 */
export function appendSoak(
  draft: PlanDraft,
  step: { rule: { durationH: number; maximumH: number | null; sources: SourceRef[] }; label: string },
): void {
  addSources(draft.sources, step.rule.sources);
  const equilibration = timeForCentreWithinTolerance({
    initialDifferenceC: draft.pendingLagC,
    toleranceC: draft.soakToleranceC,
    halfThicknessMm: draft.halfThicknessMm,
    diffusivityMm2PerS: draft.diffusivityMm2PerS,
    biot: draft.biot,
  });
  const lengthened = equilibration.durationH > step.rule.durationH;
  const durationH = lengthened ? equilibration.durationH : step.rule.durationH;
  const number = durationH > 0 ? draft.segments.length + 1 : null;
  const lengthenedBecause = lengthened
    ? `The centre starts ${draft.pendingLagC.toFixed(2)} °C behind and needs about ${equilibration.durationH.toFixed(2)} h (one-term slab solution, Fo ${equilibration.fourier.toFixed(2)}${equilibration.oneTermValid ? '' : ', below 0.2: an upper bound'}) to come within ${draft.soakToleranceC} °C, longer than the rule's ${step.rule.durationH} h.`
    : null;
  draft.soakChecks.push({
    segmentNumber: number,
    temperatureC: draft.temperatureC,
    ruleDurationH: step.rule.durationH,
    initialDifferenceC: draft.pendingLagC,
    toleranceC: draft.soakToleranceC,
    equilibrationH: equilibration.durationH,
    fourier: equilibration.fourier,
    oneTermValid: equilibration.oneTermValid,
    durationH,
    lengthenedBecause,
  });
  if (lengthenedBecause !== null) draft.notes.push(`Segment ${number} (${step.label}) lengthened: ${lengthenedBecause}`);
  if (step.rule.maximumH !== null && durationH > step.rule.maximumH) {
    draft.warnings.push({
      kind: 'soak_beyond_practice_band',
      segmentNumber: number,
      message: `The soak needs ${durationH.toFixed(2)} h, beyond the practice band's ${step.rule.maximumH} h.`,
      numbers: { durationH, maximumH: step.rule.maximumH },
    });
  }
  draft.pendingLagC = 0;
  if (number === null) {
    draft.notes.push(`${step.label}: the guidance gives no hold here and the centre is already within ${draft.soakToleranceC} °C, so no soak segment is added.`);
    return;
  }
  draft.segments.push({
    number,
    kind: 'soak',
    label: step.label,
    startTemperatureC: draft.temperatureC,
    endTemperatureC: draft.temperatureC,
    rateCPerH: null,
    durationH,
    startH: draft.elapsedH,
  });
  draft.elapsedH += durationH;
}
