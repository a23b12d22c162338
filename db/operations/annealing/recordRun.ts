import { DomainError } from '../../../src/errors/DomainError.ts';
import type { CreateRunInput } from '../../inputs/annealing.ts';
import type { Db } from '../../Db.ts';
import { annealingRunModels, annealingRuns } from '../../schema/index.ts';
import type { Actor } from '../Actor.ts';
import { recordModelEvent } from '../models/recordModelEvent.ts';
import { getModelMaterial } from './getModelMaterial.ts';
import { getPlan } from './getPlan.ts';
import { getRun, type RunView } from './getRun.ts';

// A load model up to this much thicker than planned is within sheet tolerance, not a mistake.
const THICKNESS_SLACK_MM = 0.1;

/**
 * Records an oven run with its load. A model thicker than the plan, or of another material,
 * is recorded as the lab reports it but flagged, since the lab may have had reasons. A new
 * run puts an 'annealed' event on each model's timeline; an amendment does not repeat it.
 */
export async function recordRun(db: Db, actor: Actor, input: CreateRunInput, amends?: { runId: string; reason: string }): Promise<RunView & { warnings: string[] }> {
  return db.transaction(async (tx) => {
    const plan = await getPlan(tx, actor, input.planId);
    if (plan.supersededById) {
      throw new DomainError('conflict', `Plan ${plan.id} was superseded by ${plan.supersededById}; run the current plan.`, [{ field: 'planId', message: `superseded by ${plan.supersededById}` }]);
    }
    const planModel = await getModelMaterial(tx, actor, plan.modelId);
    const warnings: string[] = [];
    const load = [];
    for (const [i, modelId] of input.modelIds.entries()) {
      const found = await getModelMaterial(tx, actor, modelId).catch((error: unknown) => {
        if (error instanceof DomainError && error.code === 'not_found') throw new DomainError('not_found', error.message, [{ field: `modelIds.${i}`, message: 'no such model in this lab' }]);
        throw error;
      });
      if (found.model.thicknessMm > plan.maxSectionThicknessMm + THICKNESS_SLACK_MM) {
        warnings.push(`Model ${found.model.code} is ${found.model.thicknessMm} mm thick; the plan was made for ${plan.maxSectionThicknessMm} mm, so its ramps may be too fast for it.`);
      }
      if (found.material.family !== planModel.material.family) {
        warnings.push(`Model ${found.model.code} is ${found.material.family}; the plan is guidance for ${planModel.material.family}.`);
      }
      load.push(found.model);
    }
    const [run] = await tx
      .insert(annealingRuns)
      .values({
        labId: actor.labId,
        planId: plan.id,
        ovenName: input.ovenName,
        operator: input.operator,
        startedAt: new Date(input.startedAt),
        notes: input.notes,
        supersedesId: amends?.runId,
        amendmentReason: amends?.reason,
        recordedByKeyId: actor.keyId,
      })
      .returning();
    await tx.insert(annealingRunModels).values(load.map((m) => ({ labId: actor.labId, runId: run!.id, modelId: m.id })));
    if (!amends) {
      for (const m of load) {
        await recordModelEvent(tx, actor, m.id, {
          kind: 'annealed',
          occurredAt: input.startedAt,
          operator: input.operator,
          temperatureC: plan.maxTemperatureC,
          notes: `${plan.guidanceKey} in ${input.ovenName}`,
          details: { annealingRunId: run!.id, annealingPlanId: plan.id },
        });
      }
    }
    return { ...(await getRun(tx, actor, run!.id)), warnings };
  });
}
