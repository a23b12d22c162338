import { DomainError } from '../errors/DomainError.ts';
import { requireNumber } from '../guards/requireNumber.ts';
import { requireMeasured } from '../uncertainty/requireMeasured.ts';
import type { Measured } from '../uncertainty/Measured.ts';
import { describeSignAssumption } from './describeSignAssumption.ts';
import { differenceOfOrders } from './differenceOfOrders.ts';
import { permanentSetShare } from './permanentSetShare.ts';
import { ratioOrUndefined } from './ratioOrUndefined.ts';
import { resolveStageSigns } from './resolveStageSigns.ts';
import { stressFromOrder } from './stressFromOrder.ts';
import type {
  OrderQuantity,
  RatioOrUndefined,
  RatioQuantity,
  SiteStagesAnalysis,
  SiteStagesInput,
  StageName,
} from './SiteStagesTypes.ts';

const COVERAGE_FACTOR = 2;

/**
 * Everything the stage readings at one site say about its residual: fabrication residual,
 * load-corrected order, permanent set, permanent-set share, inelastic fraction of the peak
 * and anneal relief, each with first-order (GUM) uncertainty and, for orders, the stress
 * N·fσ/t in MPa (edge stress at a free edge, else principal stress difference).
 *
 * Stage readings are independent inputs. N_fab enters several differences, so ratios of
 * differences carry the covariance it induces (cov(N_set, N_load − N_fab) = u(N_fab)²,
 * cov(N_pre − N_post, N_pre) = u(N_pre)²) and the share is propagated through its partial
 * derivatives in N_fab and N_post. "Within its uncertainty of zero" uses k = 2 throughout.
 *
 * @example
 * analyseSiteStages({
 *   fabrication: { order: { value: 0.30, uncertainty: 0.02 }, signKnown: true },
 *   underLoad: { order: { value: 2.40, uncertainty: 0.02 }, signKnown: true, loadN: 400 },
 *   afterUnload: { order: { value: 0.45, uncertainty: 0.02 }, signKnown: true },
 *   fringeValueNPerMm: { value: 7.0, uncertainty: 0.2 }, thicknessMm: { value: 6.0, uncertainty: 0.05 },
 *   onFreeEdge: true,
 * });
 * // loadCorrected.order 2.10 ± 0.028, edge stress 2.45 ± 0.080 MPa;
 * // permanentSet.order 0.15 ± 0.028; permanentSetShare 0.333 ± 0.053;
 * // inelasticFractionOfPeak 0.0714 ± 0.0130
 */
export function analyseSiteStages(input: SiteStagesInput): SiteStagesAnalysis {
  const fringeValue = requireMeasured('fringeValueNPerMm', input.fringeValueNPerMm, { above: 0 });
  const thickness = requireMeasured('thicknessMm', input.thicknessMm, { above: 0 });
  if (typeof input.onFreeEdge !== 'boolean') {
    throw new DomainError('invalid_input', 'onFreeEdge must be true or false', [
      { field: 'onFreeEdge', message: 'must be a boolean' },
    ]);
  }
  const signed = resolveStageSigns(input);
  if (Object.keys(signed).length === 0) {
    throw new DomainError('invalid_input', 'at least one stage reading is needed', [
      { field: 'fabrication', message: 'no stage reading given' },
    ]);
  }

  const signInfo = (uses: StageName[]): { stagesWithAssumedSign: StageName[]; signNote?: string } => {
    const stagesWithAssumedSign = uses.filter((s) => signed[s]?.signAssumed === true);
    const signNote = describeSignAssumption(stagesWithAssumedSign);
    return signNote === undefined ? { stagesWithAssumedSign } : { stagesWithAssumedSign, signNote };
  };
  const quantity = (order: Measured, uses: StageName[]): OrderQuantity => ({
    order,
    stress: stressFromOrder(order, fringeValue, thickness, input.onFreeEdge),
    ...signInfo(uses),
  });
  const ratioQuantity = (ratio: RatioOrUndefined, uses: StageName[]): RatioQuantity => ({ ...ratio, ...signInfo(uses) });

  const result: SiteStagesAnalysis = {
    coverageFactor: COVERAGE_FACTOR,
    stressKind: input.onFreeEdge ? 'edge_stress' : 'principal_stress_difference',
    stages: {},
    notes: [
      `coverage factor k = ${COVERAGE_FACTOR} for every "within its uncertainty of zero" test`,
      'stage readings treated as independent; the shared N_fab is propagated through partial derivatives',
    ],
  };
  for (const [stage, reading] of Object.entries(signed) as [StageName, { order: Measured }][]) {
    result.stages[stage] = quantity(reading.order, [stage]);
  }

  const fab = signed.fabrication?.order;
  const load = signed.underLoad?.order;
  const post = signed.afterUnload?.order;
  const pre = signed.beforeAnneal?.order;
  const annealed = signed.afterAnneal?.order;

  if (fab) result.fabricationResidual = quantity(fab, ['fabrication']);
  if (fab && load && input.underLoad) {
    const loadN = requireNumber('underLoad.loadN', input.underLoad.loadN, { above: 0 });
    result.loadCorrected = {
      ...quantity(differenceOfOrders(load, fab), ['underLoad', 'fabrication']),
      loadN,
      ...(input.onFreeEdge
        ? {
            validity: 'valid_at_free_boundary' as const,
            validityNote: 'at a free boundary the principal direction is fixed, so orders subtract',
          }
        : {
            validity: 'valid_only_if_principal_directions_agree' as const,
            validityNote: 'away from a free boundary N_load − N_fab holds only if the residual and load principal directions agree',
          }),
    };
  } else if (load) {
    result.notes.push('load-corrected order needs a fabrication reading');
  }
  if (fab && post) {
    const set = differenceOfOrders(post, fab);
    result.permanentSet = quantity(set, ['afterUnload', 'fabrication']);
    const signsKnown = signed.fabrication?.signAssumed === false && signed.afterUnload?.signAssumed === false;
    const share = permanentSetShare(fab, post, { signsKnown, coverageFactor: COVERAGE_FACTOR });
    result.permanentSetShare = { ...share, ...signInfo(['afterUnload', 'fabrication']) };
    if (result.loadCorrected) {
      const fraction = ratioOrUndefined(set, result.loadCorrected.order, {
        coverageFactor: COVERAGE_FACTOR,
        covariance: fab.uncertainty ** 2,
      });
      result.inelasticFractionOfPeak = ratioQuantity(fraction, ['afterUnload', 'underLoad', 'fabrication']);
    }
  } else if (post) {
    result.notes.push('permanent set needs a fabrication reading');
  }
  if (pre && annealed) {
    const relief = ratioOrUndefined(differenceOfOrders(pre, annealed), pre, {
      coverageFactor: COVERAGE_FACTOR,
      covariance: pre.uncertainty ** 2,
    });
    result.annealRelief = ratioQuantity(relief, ['beforeAnneal', 'afterAnneal']);
  } else if (pre || annealed) {
    result.notes.push('anneal relief needs both the before-anneal and after-anneal readings');
  }
  return result;
}
