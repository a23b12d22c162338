import { describe, expect, it } from 'vitest';
import { clientFor } from '../support/client.ts';
import { factoriesFor } from '../support/factories.ts';
import { inLab } from '../support/inLab.ts';

interface Operation {
  'x-min-role'?: string;
}
type Paths = Record<string, Record<string, Operation>>;

const ID_OF: Record<string, string> = { models: 'modelId', sites: 'siteId', readings: 'readingId', batches: 'batchId', materials: 'materialId', keys: 'keyId' };
const JSON_BODY = { body: '{}', headers: { 'content-type': 'application/json' } };
const SECURITY_HEADERS = ['x-content-type-options', 'x-frame-options', 'referrer-policy', 'strict-transport-security', 'cross-origin-opener-policy'];

function fill(template: string, ids: Record<string, string>): string {
  return template.replace(/\/([^/]+)\/\{[^}]+\}/g, (_m, collection: string) => `/${collection}/${ids[ID_OF[collection] ?? ''] ?? crypto.randomUUID()}`);
}

describe('access matrix over the route table', () => {
  it('refuses every route to a revoked key and to a malformed one, with the same 401', () =>
    inLab(
      async ({ app, admin, anonymous }) => {
        const paths = (await anonymous.get('/openapi.json')).body.paths as Paths;
        const issued = (await admin.post('/v1/keys', { label: 'leaver', role: 'admin' })).body;
        expect((await admin.post(`/v1/keys/${issued.id}/revoke`)).status).toBe(200);
        const revoked = clientFor(app, issued.secret);
        const malformed = clientFor(app, `${issued.secret}x`);
        let checked = 0;
        for (const [template, operations] of Object.entries(paths)) {
          for (const [method, op] of Object.entries(operations)) {
            if (!op['x-min-role']) continue;
            for (const client of [revoked, malformed]) {
              const reply = await client.send(method.toUpperCase(), fill(template, {}), JSON_BODY);
              expect(reply.status, `${method} ${template}`).toBe(401);
              expect(reply.body.code).toBe('unauthorized');
              expect(reply.headers.get('www-authenticate')).toMatch(/^Bearer/);
              checked++;
            }
          }
        }
        expect(checked).toBeGreaterThan(40);
      },
      { AUTH_FAILURE_LIMIT: 10_000 },
    ));

  it("answers another lab's ids with 404 on every route that takes an id, never with the record", () =>
    inLab(async ({ app, admin, anonymous, otherLab }) => {
      const paths = (await anonymous.get('/openapi.json')).body.paths as Paths;
      const other = await otherLab();
      const make = factoriesFor(other.admin);
      const batch = await make.batch();
      const model = await make.model({ batchId: batch.id });
      const site = await make.site({ modelId: model.id, label: 'foreign notch root' });
      const reading = await make.reading(site.id, { operator: 'foreign operator' });
      const key = (await other.admin.post('/v1/keys', { label: 'foreign key', role: 'viewer' })).body;
      const ids = { siteId: site.id, readingId: reading.id, modelId: model.id, batchId: batch.id, materialId: batch.materialId, keyId: key.id };
      const secrets: string[] = [site.label, reading.operator, model.code, batch.code, key.label];
      expect(secrets.every((s) => typeof s === 'string' && s.length > 3)).toBe(true);
      let checked = 0;
      for (const [template, operations] of Object.entries(paths)) {
        if (!template.includes('{')) continue;
        for (const [method, op] of Object.entries(operations)) {
          if (!op['x-min-role']) continue;
          const reply = await admin.send(method.toUpperCase(), fill(template, ids), JSON_BODY);
          const label = `${method} ${template} → ${reply.status}`;
          if (method === 'get') expect(reply.status, label).toBe(404);
          else expect(reply.status >= 400 && reply.status < 500 && ![401, 403].includes(reply.status), label).toBe(true);
          for (const secret of secrets) expect(reply.text, label).not.toContain(secret);
          checked++;
        }
      }
      expect(checked).toBeGreaterThan(15);
      // With bodies that pass validation, writes on another lab's records are 404 too.
      const valid = { stage: 'before_load', observedAt: '2026-11-21T14:05:00Z', operator: 'intruder', wavelengthNm: 577, reading: { method: 'direct', fringeOrder: 0.1 } };
      expect((await admin.post(`/v1/sites/${site.id}/readings`, valid)).status).toBe(404);
      expect((await admin.post(`/v1/readings/${reading.id}/amendments`, { ...valid, reason: 'takeover' })).status).toBe(404);
      expect((await admin.post(`/v1/models/${model.id}/sites`, { label: 'planted', kind: 'notch_root', onFreeEdge: true })).status).toBe(404);
      expect((await admin.post(`/v1/keys/${key.id}/revoke`)).status).toBe(404);
      expect((await other.admin.get(`/v1/readings/${reading.id}`)).body.supersededById).toBeNull();
      expect((await clientFor(app, key.secret).get('/v1/whoami')).status).toBe(200);
    }));

  it('limits wrong keys per address: 429 with Retry-After, even for a right key, until the window passes', () =>
    inLab(
      async ({ app, viewer }) => {
        const guesser = clientFor(app, 'flk_guess');
        for (let i = 0; i < 5; i++) expect((await guesser.get('/v1/whoami')).status).toBe(401);
        const limited = await guesser.get('/v1/whoami');
        expect(limited.status).toBe(429);
        expect(limited.body.code).toBe('rate_limited');
        expect(Number(limited.headers.get('retry-after'))).toBeGreaterThanOrEqual(1);
        expect((await viewer.get('/v1/whoami')).status).toBe(429);
        await new Promise((resolve) => setTimeout(resolve, 2100));
        expect((await viewer.get('/v1/whoami')).status).toBe(200);
      },
      { AUTH_FAILURE_LIMIT: 5, AUTH_FAILURE_WINDOW_S: 2 },
    ));

  it('counts wrong keys at the pages\' sign-in against the same limit as the API', () =>
    inLab(
      async ({ app, viewer }) => {
        const signIn = (key: string) =>
          app.request('/lab/sign-in', { method: 'POST', headers: { 'content-type': 'application/x-www-form-urlencoded', origin: 'http://localhost' }, body: `key=${encodeURIComponent(key)}` });
        for (let i = 0; i < 3; i++) expect((await signIn('flk_guess')).status).toBe(401);
        const limited = await signIn('flk_guess');
        expect(limited.status).toBe(429);
        expect(Number(limited.headers.get('retry-after'))).toBeGreaterThanOrEqual(1);
        expect((await viewer.get('/v1/whoami')).status).toBe(429);
      },
      { AUTH_FAILURE_LIMIT: 3, AUTH_FAILURE_WINDOW_S: 60 },
    ));

  it('sends the security headers on pages, API answers and refusals', () =>
    inLab(async ({ anonymous, viewer }) => {
      const paths = ['/docs', '/lab', '/openapi.json', '/v1/whoami'];
      for (const path of paths) {
        const reply = await anonymous.send('GET', path);
        for (const header of SECURITY_HEADERS) expect(reply.headers.get(header), `${header} on ${path} (${reply.status})`).toBeTruthy();
        expect(reply.headers.get('x-content-type-options')).toBe('nosniff');
      }
      const ok = await viewer.get('/v1/whoami');
      for (const header of SECURITY_HEADERS) expect(ok.headers.get(header), header).toBeTruthy();
    }));
});
