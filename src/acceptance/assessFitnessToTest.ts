import { DomainError } from '../errors/DomainError.ts';
import { requireNumber } from '../guards/requireNumber.ts';
import { ratioOrUndefined } from '../residual/ratioOrUndefined.ts';
import { requireMeasured } from '../uncertainty/requireMeasured.ts';
import type { Measured } from '../uncertainty/Measured.ts';
import { decideWithGuardBand } from './decideWithGuardBand.ts';
import type { CriterionName, CriterionResult, FitnessAssessment, FitnessInput } from './FitnessTypes.ts';

const CRITERIA: readonly CriterionName[] = ['maxResidualFringeOrder', 'maxResidualStressMPa', 'maxResidualFractionOfTestOrder'];

const magnitude = (m: Measured): Measured => ({ value: Math.abs(m.value), uncertainty: m.uncertainty });

const missing = (field: string, criterion: CriterionName): never => {
  throw new DomainError('invalid_input', `${criterion} needs ${field}`, [{ field, message: `required by ${criterion}` }]);
};

/**
 * Is the model fit to test as it is? Each criterion given is judged on the residual's
 * magnitude with an ISO 14253-1 style guard band (k = 2 unless stated); the worst wins:
 * any not conforming → 'needs_annealing', else any undecided → 'undecided', else
 * 'conforming'. The fraction criterion uses |N_res|/|N_test| with first-order uncertainty
 * and is undecided when the test order cannot be told from zero.
 *
 * @example
 * assessFitnessToTest({
 *   residualOrder: { value: 0.12, uncertainty: 0.02 },
 *   testFringeOrder: { value: 6.0, uncertainty: 0.17 },
 *   criteria: { maxResidualFringeOrder: 0.2, maxResidualFractionOfTestOrder: 0.05 },
 * });
 * // decision 'conforming': 0.12 + 0.04 ≤ 0.2 fringe; fraction 0.0200 ± 0.0034, 0.0268 ≤ 0.05
 */
export function assessFitnessToTest(input: FitnessInput): FitnessAssessment {
  const k = requireNumber('coverageFactor', input.coverageFactor ?? 2, { above: 0 });
  const criteria = input.criteria ?? {};
  const given = CRITERIA.filter((c) => criteria[c] !== undefined);
  if (given.length === 0) {
    throw new DomainError('invalid_input', 'at least one acceptance criterion is needed', [
      { field: 'criteria', message: `give any of ${CRITERIA.join(', ')}` },
    ]);
  }
  const residual = magnitude(requireMeasured('residualOrder', input.residualOrder));

  const results = given.map((criterion): CriterionResult => {
    const limit = requireNumber(`criteria.${criterion}`, criteria[criterion] as number, { above: 0 });
    const judge = (judged: Measured): CriterionResult => ({
      criterion,
      evaluated: true,
      limit,
      judged,
      guardBand: decideWithGuardBand(judged, limit, k),
    });
    if (criterion === 'maxResidualFringeOrder') return judge(residual);
    if (criterion === 'maxResidualStressMPa') {
      const stress = input.residualStressMPa ?? missing('residualStressMPa', criterion);
      return judge(magnitude(requireMeasured('residualStressMPa', stress)));
    }
    const test = input.testFringeOrder ?? missing('testFringeOrder', criterion);
    const fraction = ratioOrUndefined(residual, magnitude(requireMeasured('testFringeOrder', test)), { coverageFactor: k });
    if (!fraction.defined) {
      return { criterion, evaluated: false, limit, decision: 'undecided', reason: `test fringe order: ${fraction.reason}` };
    }
    return judge(fraction.ratio);
  });

  const decisions = results.map((r) => (r.evaluated ? r.guardBand.decision : r.decision));
  const decision = decisions.includes('not_conforming')
    ? 'needs_annealing'
    : decisions.includes('undecided')
      ? 'undecided'
      : 'conforming';
  return { decision, coverageFactor: k, criteria: results };
}
