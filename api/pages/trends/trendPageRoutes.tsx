import type { Hono } from 'hono';
import type { AppEnv } from '../../AppEnv.ts';
import { loadTrends } from './loadTrends.ts';
import { TrendsPage } from './TrendsPage.tsx';

export function trendPageRoutes(app: Hono<AppEnv>): void {
  app.get('/trends', async (c) => c.html(<TrendsPage data={await loadTrends(c.var.db, c.var.actor, c.req.query('stage'), c.req.query('batch')?.slice(0, 120))} />));
}
