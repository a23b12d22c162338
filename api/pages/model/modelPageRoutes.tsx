import type { Hono } from 'hono';
import { roleAtLeast } from '../../../db/operations/Actor.ts';
import type { AppEnv } from '../../AppEnv.ts';
import { isUuid } from '../shell/isUuid.ts';
import { loadModelPage } from './loadModelPage.ts';
import { ModelPage } from './ModelPage.tsx';

export function modelPageRoutes(app: Hono<AppEnv>): void {
  app.get('/models/:id', async (c) => {
    const id = c.req.param('id');
    if (!isUuid(id)) return c.notFound();
    const q = c.req.query();
    const data = await loadModelPage(c.var.db, c.var.actor, id, { siteId: q.site, stage: q.stage, cursor: q.cursor, chartStage: q.chartStage });
    return c.html(<ModelPage data={data} canWrite={roleAtLeast(c.var.actor.role, 'technician')} flash={q.saved ? 'Reading saved; the analysis above includes it.' : undefined} />);
  });
}
