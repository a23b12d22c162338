import { parse } from 'csv-parse/sync';
import type { Hono } from 'hono';
import type { Actor } from '../../../db/operations/Actor.ts';
import type { Db } from '../../../db/Db.ts';
import { getPlan } from '../../../db/operations/annealing/getPlan.ts';
import { getRun } from '../../../db/operations/annealing/getRun.ts';
import { ovenLogSamplesCsv } from '../../../db/operations/annealing/ovenLogSamplesCsv.ts';
import { planForModel } from '../../../db/operations/annealing/planForModel.ts';
import { getModel } from '../../../db/operations/models/getModel.ts';
import type { AppEnv } from '../../AppEnv.ts';
import { formatInstant } from '../shell/formatInstant.ts';
import { isUuid } from '../shell/isUuid.ts';
import { Layout } from '../shell/Layout.tsx';
import { PlanSheet } from './PlanSheet.tsx';
import { RunPage } from './RunPage.tsx';
import type { LoggedSample } from '../plots/OvenProfilePlot.tsx';

/** The log's samples on the plan's time axis; a timestamped log is placed from the run's start. */
async function loggedSamples(db: Db, actor: Actor, logId: string, startedAt: Date): Promise<LoggedSample[]> {
  // The samples operation answers in the import's CSV columns; reading them back keeps one source of truth.
  const rows = parse(await ovenLogSamplesCsv(db, actor, logId), { columns: true }) as Record<string, string>[];
  return rows.map((r) => ({
    elapsedH: r.elapsed_h !== undefined ? Number(r.elapsed_h) : (Date.parse(r.timestamp!) - startedAt.getTime()) / 3_600_000,
    temperatureC: Number(r.temperature_c),
  }));
}

export function annealingPageRoutes(app: Hono<AppEnv>): void {
  app.get('/plans/:id', async (c) => {
    const id = c.req.param('id');
    if (!isUuid(id)) return c.notFound();
    const plan = await getPlan(c.var.db, c.var.actor, id);
    const model = await getModel(c.var.db, c.var.actor, plan.modelId);
    const standing = `Stored plan for model ${model.code}, made ${formatInstant(plan.createdAt)}${plan.supersededById ? '; superseded by a newer plan: do not run this one' : ''}.`;
    return c.html(<Layout title={`Annealing plan for ${model.code}`} printable><PlanSheet heading={`Annealing plan for ${model.code}`} standing={standing} plan={plan.plan} /></Layout>);
  });

  app.get('/models/:id/annealing-draft', async (c) => {
    const id = c.req.param('id');
    if (!isUuid(id)) return c.notFound();
    const model = await getModel(c.var.db, c.var.actor, id);
    const draft = await planForModel(c.var.db, c.var.actor, id, {});
    const standing = `Draft from ${draft.entry.title} for model ${model.code} (${draft.thicknessMm} mm), not stored: store it through the API before running it so the run can name its plan.`;
    return c.html(<Layout title={`Draft annealing schedule for ${model.code}`} printable><PlanSheet heading={`Draft annealing schedule for ${model.code}`} standing={standing} plan={draft.plan} /></Layout>);
  });

  app.get('/runs/:id', async (c) => {
    const id = c.req.param('id');
    if (!isUuid(id)) return c.notFound();
    const run = await getRun(c.var.db, c.var.actor, id);
    const plan = await getPlan(c.var.db, c.var.actor, run.plan.id);
    const samples = run.currentLog ? await loggedSamples(c.var.db, c.var.actor, run.currentLog.id, run.startedAt) : [];
    return c.html(<RunPage run={run} plan={plan.plan} samples={samples} />);
  });
}
