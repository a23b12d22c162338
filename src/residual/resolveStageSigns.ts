import { requireMeasured } from '../uncertainty/requireMeasured.ts';
import type { Measured } from '../uncertainty/Measured.ts';
import type { SiteStagesInput, StageName } from './SiteStagesTypes.ts';

export interface SignedStageOrder {
  order: Measured;
  /** The reading had no measured sign and was taken as positive (tension). */
  signAssumed: boolean;
}

const STAGES: readonly StageName[] = ['fabrication', 'underLoad', 'afterUnload', 'beforeAnneal', 'afterAnneal'];

/**
 * Gives every stage reading present a signed order. A reading without a measured sign must
 * be a magnitude ≥ 0 and is taken as positive, so all unsigned readings share one sign:
 * the only assumption that lets differences of magnitudes mean anything.
 *
 * @example
 * resolveStageSigns({
 *   fabrication: { order: { value: 0.3, uncertainty: 0.02 }, signKnown: false },
 *   afterUnload: { order: { value: -0.2, uncertainty: 0.02 }, signKnown: true },
 *   fringeValueNPerMm: { value: 7, uncertainty: 0.2 }, thicknessMm: { value: 6, uncertainty: 0.05 },
 *   onFreeEdge: true,
 * });
 * // { fabrication: { order: { value: 0.3, uncertainty: 0.02 }, signAssumed: true },
 * //   afterUnload: { order: { value: -0.2, uncertainty: 0.02 }, signAssumed: false } }
 */
export function resolveStageSigns(input: SiteStagesInput): Partial<Record<StageName, SignedStageOrder>> {
  const out: Partial<Record<StageName, SignedStageOrder>> = {};
  for (const stage of STAGES) {
    const reading = input[stage];
    if (reading === undefined) continue;
    const signAssumed = reading.signKnown !== true;
    const order = requireMeasured(`${stage}.order`, reading.order, signAssumed ? { min: 0 } : {});
    out[stage] = { order, signAssumed };
  }
  return out;
}
