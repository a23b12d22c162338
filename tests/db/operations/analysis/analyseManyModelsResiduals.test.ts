import { describe, expect, it } from 'vitest';
import { analyseManyModelsResiduals } from '../../../../db/operations/analysis/analyseManyModelsResiduals.ts';
import { analyseModelResiduals } from '../../../../db/operations/analysis/analyseModelResiduals.ts';
import { findActorByKey } from '../../../../db/operations/keys/findActorByKey.ts';
import { factoriesFor } from '../../../support/factories.ts';
import { inLab } from '../../../support/inLab.ts';

const tardy = (beta: number) => ({ method: 'tardy', lowerOrder: 0, analyzerRotationDeg: beta, movedFringe: 'lower' });

describe('analyseManyModelsResiduals', () => {
  it('answers for each model what the single analysis answers, in the order asked, leaving out other labs', () =>
    inLab(async ({ db, keys, admin, make, otherLab }) => {
      const actor = (await findActorByKey(db, keys.viewer))!;
      const batch = await make.batch();
      const byProject = await make.model({ batchId: batch.id, project: 'series A' });
      const byModel = await make.model({ batchId: batch.id, project: 'series A' });
      const bare = await make.model();
      for (const [model, betas] of [[byProject, [18, 27]], [byModel, [45, 54]]] as const) {
        const site = await make.site({ modelId: model.id });
        await make.site({ modelId: model.id, label: 'second site' });
        for (const [i, beta] of betas.entries()) await make.reading(site.id, { stage: i === 0 ? 'before_load' : 'after_unload', observedAt: `2026-11-2${i}T10:00:00Z`, reading: tardy(beta) });
      }
      expect((await admin.post('/v1/acceptance-criteria', { project: 'series A', maxResidualFringeOrder: 0.5 })).status).toBe(201);
      expect((await admin.post('/v1/acceptance-criteria', { modelId: byModel.id, maxResidualFringeOrder: 0.2, reason: 'tighter' })).status).toBe(201);
      const foreignModel = (await factoriesFor((await otherLab()).admin).model()).id;

      const order = [bare.id, byModel.id, foreignModel, byProject.id];
      const many = await analyseManyModelsResiduals(db, actor, order);
      expect(many.map((a) => a.model.id)).toEqual([bare.id, byModel.id, byProject.id]);
      for (const analysis of many) expect(analysis).toEqual(await analyseModelResiduals(db, actor, analysis.model.id));
      expect(many.map((a) => [a.limits.source, a.decision])).toEqual([
        ['common_practice', 'no_readings'],
        ['model', 'needs_annealing'],
        ['project', 'conforming'],
      ]);
      expect(await analyseManyModelsResiduals(db, actor, [])).toEqual([]);
    }));
});
