import type { Db } from '../../Db.ts';
import type { Actor } from '../Actor.ts';
import { composeResidualAnalysis } from './composeResidualAnalysis.ts';
import { readAnalysisInputs } from './readAnalysisInputs.ts';

/**
 * The residual analyses of many models with a fixed number of queries, in the order asked;
 * models not in the lab are left out. Each is what analyseModelResiduals answers for it.
 */
export async function analyseManyModelsResiduals(db: Db, actor: Actor, modelIds: readonly string[]) {
  const inputs = await readAnalysisInputs(db, actor, modelIds);
  return modelIds.flatMap((id) => {
    const found = inputs.get(id);
    return found ? [composeResidualAnalysis(found)] : [];
  });
}
