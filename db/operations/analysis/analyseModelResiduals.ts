import { DomainError } from '../../../src/errors/DomainError.ts';
import type { Db } from '../../Db.ts';
import type { Actor } from '../Actor.ts';
import { composeResidualAnalysis } from './composeResidualAnalysis.ts';
import { readAnalysisInputs } from './readAnalysisInputs.ts';

/**
 * The residual analysis of a model: the fringe value in use, the limits in force, and per
 * site every stage quantity, Kt and the fitness decision; the model's decision is its worst
 * site's. Only current readings count (an amended reading is replaced by its amendment).
 */
export async function analyseModelResiduals(db: Db, actor: Actor, modelId: string) {
  const inputs = (await readAnalysisInputs(db, actor, [modelId])).get(modelId);
  if (!inputs) throw new DomainError('not_found', `No model ${modelId} in this lab.`);
  return composeResidualAnalysis(inputs);
}
