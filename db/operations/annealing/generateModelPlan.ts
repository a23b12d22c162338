import { DomainError } from '../../../src/errors/DomainError.ts';
import type { GeneratePlanInput } from '../../inputs/annealing.ts';
import type { Db } from '../../Db.ts';
import { annealingPlans } from '../../schema/index.ts';
import type { Actor } from '../Actor.ts';
import { getPlan } from './getPlan.ts';
import { planForModel } from './planForModel.ts';
import { type PlanView, planViewOf } from './PlanView.ts';

/** Generates a plan for a model and stores it as a record; a replacement names the plan it supersedes. */
export async function generateModelPlan(db: Db, actor: Actor, modelId: string, input: GeneratePlanInput): Promise<PlanView> {
  const { supersedesPlanId, reason, ...request } = input;
  return db.transaction(async (tx) => {
    if (supersedesPlanId) {
      const previous = await getPlan(tx, actor, supersedesPlanId);
      if (previous.modelId !== modelId) {
        throw new DomainError('invalid_input', `Plan ${supersedesPlanId} is for another model.`, [{ field: 'supersedesPlanId', message: 'a plan of this model' }]);
      }
      if (previous.supersededById) {
        throw new DomainError('conflict', `Plan ${supersedesPlanId} was already superseded by ${previous.supersededById}.`, [{ field: 'supersedesPlanId', message: `superseded by ${previous.supersededById}` }]);
      }
    }
    const draft = await planForModel(tx, actor, modelId, request);
    const [row] = await tx
      .insert(annealingPlans)
      .values({
        labId: actor.labId,
        modelId,
        guidanceEntryId: draft.entry.id,
        guidanceKey: draft.entry.key,
        catalogueVersion: draft.entry.catalogueVersion,
        chosenBy: draft.chosenBy,
        maxSectionThicknessMm: draft.thicknessMm,
        thicknessSource: draft.thicknessSource,
        startTemperatureC: draft.plan.startTemperatureC,
        ovenLimits: request.ovenLimits ?? {},
        plan: draft.plan as unknown as Record<string, unknown>,
        totalDurationH: draft.plan.totalDurationH,
        maxTemperatureC: draft.plan.maxTemperatureC,
        supersedesId: supersedesPlanId,
        amendmentReason: reason,
        recordedByKeyId: actor.keyId,
      })
      .returning();
    return planViewOf(row!, null);
  });
}
