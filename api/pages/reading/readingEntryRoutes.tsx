import type { Context, Hono } from 'hono';
import { roleAtLeast } from '../../../db/operations/Actor.ts';
import { getModel } from '../../../db/operations/models/getModel.ts';
import { listSites } from '../../../db/operations/models/listSites.ts';
import { recordReading } from '../../../db/operations/readings/recordReading.ts';
import type { AppEnv } from '../../AppEnv.ts';
import { isUuid } from '../shell/isUuid.ts';
import { previewReading } from './previewReading.ts';
import { ReadingEntryPage } from './ReadingEntryPage.tsx';
import { type FormValues, readingFromForm } from './readingFromForm.ts';

const nowUtcMinute = () => new Date().toISOString().slice(0, 16);

async function modelAndSites(c: Context<AppEnv>, id: string) {
  const model = await getModel(c.var.db, c.var.actor, id);
  const sites = await listSites(c.var.db, c.var.actor, id);
  return { model: { id: model.id, code: model.code }, sites: sites.map((s) => ({ id: s.id, label: s.label })) };
}

function refuseViewer(c: Context<AppEnv>) {
  return c.text('Your key may read the lab but not record readings; ask for a technician key.', 403);
}

export function readingEntryRoutes(app: Hono<AppEnv>): void {
  app.get('/models/:id/readings/new', async (c) => {
    const id = c.req.param('id');
    if (!isUuid(id)) return c.notFound();
    if (!roleAtLeast(c.var.actor.role, 'technician')) return refuseViewer(c);
    const { model, sites } = await modelAndSites(c, id);
    const site = c.req.query('site');
    return c.html(<ReadingEntryPage model={model} sites={sites} values={{ observedAt: nowUtcMinute(), ...(site ? { site } : {}) }} />);
  });

  app.post('/models/:id/readings', async (c) => {
    const id = c.req.param('id');
    if (!isUuid(id)) return c.notFound();
    if (!roleAtLeast(c.var.actor.role, 'technician')) return refuseViewer(c);
    const { model, sites } = await modelAndSites(c, id);
    const body = await c.req.parseBody();
    const values: FormValues = Object.fromEntries(Object.entries(body).filter((e): e is [string, string] => typeof e[1] === 'string'));
    const page = (extra: { problems?: string[]; preview?: Parameters<typeof ReadingEntryPage>[0]['preview'] }, status: 200 | 422 = 200) =>
      c.html(<ReadingEntryPage model={model} sites={sites} values={values} {...extra} />, status);
    const parsed = readingFromForm(values);
    if (!parsed.ok) return page({ problems: parsed.problems }, 422);
    if (!sites.some((s) => s.id === parsed.siteId)) return page({ problems: ['Site: not a site of this model'] }, 422);
    const derived = previewReading(parsed.input);
    if (!derived.ok) return page({ problems: derived.problems }, 422);
    if (values.action !== 'save') return page({ preview: derived.preview });
    await recordReading(c.var.db, c.var.actor, parsed.siteId, parsed.input);
    return c.redirect(`/lab/models/${model.id}?saved=1&site=${parsed.siteId}#readings`, 303);
  });
}
