import type { Hono } from 'hono';
import type { AppEnv } from '../../AppEnv.ts';
import { loadOverview } from './loadOverview.ts';
import { OverviewPage } from './OverviewPage.tsx';

export function overviewRoutes(app: Hono<AppEnv>): void {
  app.get('/', async (c) => {
    const cursor = c.req.query('cursor');
    const overview = await loadOverview(c.var.db, c.var.actor, cursor && cursor.length <= 200 ? cursor : undefined);
    return c.html(<OverviewPage overview={overview} flash={c.req.query('saved') ? 'Reading saved.' : undefined} />);
  });
}
