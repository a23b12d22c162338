import { describe, expect, it } from 'vitest';
import type { LabContext } from '../support/inLab.ts';
import { inLab } from '../support/inLab.ts';

const ORIGIN = 'http://localhost';
type App = LabContext['app'];

const page = (app: App, path: string, key?: string) => app.request(path, { headers: key ? { cookie: `fl_key=${key}` } : {} });
const form = (app: App, path: string, fields: Record<string, string>, key?: string, origin = ORIGIN) =>
  app.request(path, {
    method: 'POST',
    headers: { 'content-type': 'application/x-www-form-urlencoded', origin, ...(key ? { cookie: `fl_key=${key}` } : {}) },
    body: new URLSearchParams(fields).toString(),
  });

const colourReading = (siteId: string, action: 'preview' | 'save', retardationNm: number) => ({
  site: siteId, stage: 'before_load', observedAt: '2026-11-21T14:05', operator: 'R. Okafor', sign: 'unknown', method: 'white_light_colour', colourPick: String(retardationNm), action,
});

describe('lab pages', () => {
  it('signs in with a key into an HttpOnly, SameSite=Strict cookie, refuses a wrong key and signs out', () =>
    inLab(async ({ app, keys }) => {
      const ok = await form(app, '/lab/sign-in', { key: keys.viewer, next: '/lab/trends' });
      expect(ok.status).toBe(303);
      expect(ok.headers.get('location')).toBe('/lab/trends');
      const cookie = ok.headers.get('set-cookie')!;
      expect(cookie).toMatch(/^fl_key=/);
      expect(cookie).toMatch(/HttpOnly/);
      expect(cookie).toMatch(/SameSite=Strict/);
      expect(cookie).not.toMatch(/Secure/);
      const https = await app.request('https://localhost/lab/sign-in', { method: 'POST', headers: { 'content-type': 'application/x-www-form-urlencoded', origin: 'https://localhost' }, body: `key=${keys.viewer}` });
      expect(https.headers.get('set-cookie')).toMatch(/Secure/);
      const wrong = await form(app, '/lab/sign-in', { key: 'flk_not-a-key' });
      expect(wrong.status).toBe(401);
      expect(wrong.headers.get('set-cookie')).toBeNull();
      const offsite = await form(app, '/lab/sign-in', { key: keys.viewer, next: '//elsewhere.example/' });
      expect(offsite.headers.get('location')).toBe('/lab');
      const out = await form(app, '/lab/sign-out', {}, keys.viewer);
      expect(out.status).toBe(303);
      expect(out.headers.get('set-cookie')).toMatch(/fl_key=;.*Max-Age=0/);
    }));

  it('sends a reader without a cookie to sign in and refuses a post without one', () =>
    inLab(async ({ app, make }) => {
      const model = await make.model();
      const reply = await page(app, `/lab/models/${model.id}`);
      expect(reply.status).toBe(303);
      expect(reply.headers.get('location')).toBe(`/lab/sign-in?next=${encodeURIComponent(`/lab/models/${model.id}`)}`);
      expect((await page(app, '/lab', 'flk_revoked-or-unknown')).status).toBe(303);
      expect((await form(app, `/lab/models/${model.id}/readings`, { site: 'x' })).status).toBe(401);
      expect((await page(app, '/lab/sign-in')).status).toBe(200);
    }));

  it('refuses cross-origin form posts and bodies that are not forms', () =>
    inLab(async ({ app, keys }) => {
      expect((await form(app, '/lab/sign-in', { key: keys.admin }, undefined, 'https://evil.example')).status).toBe(403);
      const json = await app.request('/lab/sign-in', { method: 'POST', headers: { 'content-type': 'application/json', origin: ORIGIN }, body: JSON.stringify({ key: keys.admin }) });
      expect(json.status).toBe(415);
    }));

  it('renders an empty lab, with a policy that allows only self', () =>
    inLab(async ({ app, keys }) => {
      const overview = await page(app, '/lab', keys.viewer);
      expect(overview.status).toBe(200);
      expect(overview.headers.get('content-security-policy')).toMatch(/default-src 'self'/);
      expect(overview.headers.get('content-security-policy')).toMatch(/style-src 'self';/);
      expect(overview.headers.get('cache-control')).toBe('no-store');
      expect(await overview.text()).toContain('No models recorded yet');
      const trends = await page(app, '/lab/trends', keys.viewer);
      expect(trends.status).toBe(200);
      expect(await trends.text()).toContain('no readings at this stage');
      const css = await page(app, '/lab/assets/lab.css');
      expect(css.headers.get('content-type')).toMatch(/text\/css/);
      expect(await css.text()).toContain('@media print');
    }));

  it('previews a colour reading without storing it, then saves it and the decision changes', () =>
    inLab(async ({ app, keys, make, viewer }) => {
      const model = await make.model();
      const site = await make.site({ modelId: model.id, label: 'upper notch root' });
      expect(await (await page(app, `/lab/models/${model.id}`, keys.viewer)).text()).toContain('Not yet read');
      const preview = await form(app, `/lab/models/${model.id}/readings`, colourReading(site.id, 'preview', 580), keys.technician);
      expect(preview.status).toBe(200);
      const shown = await preview.text();
      // the tint of passage at 577 nm is one fringe [M: Dally & Riley table]; 580 nm reads as N = 580/577 = 1.0052 [C]
      expect(shown.match(/N = [0-9.]+ ± [0-9.]+/)?.[0]).toBe('N = 1.0052 ± 0.0040');
      expect(shown.includes('Save this reading')).toBe(true);
      expect((await viewer.get(`/v1/models/${model.id}/residual-analysis`)).body.decision).toBe('no_readings');
      const saved = await form(app, `/lab/models/${model.id}/readings`, colourReading(site.id, 'save', 580), keys.technician);
      expect(saved.status).toBe(303);
      expect(saved.headers.get('location')).toContain(`/lab/models/${model.id}?saved=1`);
      const after = await (await page(app, `/lab/models/${model.id}`, keys.viewer)).text();
      expect(after).toContain('Anneal first');
      expect(after).toContain('white-light colour');
      expect((await viewer.get(`/v1/models/${model.id}/residual-analysis`)).body.decision).toBe('needs_annealing');
    }));

  it('shows form problems in words, flags an ambiguous colour, and keeps viewers out of the bench form', () =>
    inLab(async ({ app, keys, make }) => {
      const model = await make.model();
      const site = await make.site({ modelId: model.id });
      const missing = await form(app, `/lab/models/${model.id}/readings`, { ...colourReading(site.id, 'preview', 580), operator: '', colourPick: '' }, keys.technician);
      expect(missing.status).toBe(422);
      expect(await missing.text()).toContain('Operator');
      const named = await form(app, `/lab/models/${model.id}/readings`, { ...colourReading(site.id, 'preview', 0), colourPick: '', colourName: 'orange' }, keys.technician);
      expect(await named.text()).toContain('Ambiguous colour');
      expect((await page(app, `/lab/models/${model.id}/readings/new`, keys.viewer)).status).toBe(403);
      expect((await form(app, `/lab/models/${model.id}/readings`, colourReading(site.id, 'save', 580), keys.viewer)).status).toBe(403);
    }));

  it('prints an annealing plan with its cautions', () =>
    inLab(async ({ app, keys, make, technician }) => {
      const model = await make.model({ thicknessMm: 6 });
      const plan = await technician.post(`/v1/models/${model.id}/annealing-plans`, {});
      expect(plan.status, plan.text).toBe(201);
      const sheet = await page(app, `/lab/plans/${plan.body.id}`, keys.viewer);
      expect(sheet.status).toBe(200);
      const html = await sheet.text();
      expect(html).toContain('Cautions');
      expect(html).toContain(plan.body.cautions[0].replaceAll("'", '&#39;').slice(0, 30));
      expect(html).toContain('Oven programme');
    }));

  it('renders a model with 10,000 readings quickly, paged and with a bounded plot', () =>
    inLab(async ({ app, keys, make, technician }) => {
      const model = await make.model({ code: 'BULK-1' });
      await make.site({ modelId: model.id, label: 'upper notch root' });
      const start = Date.parse('2026-01-01T00:00:00Z');
      const rows = Array.from({ length: 10_000 }, (_, i) => `BULK-1,upper notch root,before_load,,${new Date(start + i * 60_000).toISOString()},R. Okafor,577,direct,,,,,,${(0.05 + (i % 37) / 1000).toFixed(3)},unknown,`);
      const body = `model_code,site_label,stage,load_n,observed_at,operator,wavelength_nm,method,whole_order,lower_order,analyzer_rotation_deg,moved_fringe,retardation_nm,fringe_order,sign,notes\n${rows.join('\n')}\n`;
      const imported = await technician.send('POST', '/v1/readings/import', { body, headers: { 'content-type': 'text/csv' } });
      expect(imported.status, imported.text).toBe(201);
      const t0 = performance.now();
      const reply = await page(app, `/lab/models/${model.id}`, keys.viewer);
      const elapsedMs = performance.now() - t0;
      expect(reply.status).toBe(200);
      const html = await reply.text();
      expect(elapsedMs).toBeLessThan(15_000);
      expect(html.length).toBeLessThan(400_000);
      expect((html.match(/<circle/g) ?? []).length).toBeLessThan(700);
      expect(html).toContain('10000 points drawn as');
      expect(html).toContain('Later readings');
      expect((html.match(/<tr>/g) ?? []).length).toBeLessThan(60);
    }));
});
