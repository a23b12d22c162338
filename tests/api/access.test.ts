import { describe, expect, it } from 'vitest';
import { clientFor } from '../support/client.ts';
import { inLab } from '../support/inLab.ts';

type Role = 'viewer' | 'technician' | 'admin';
const ROLES: Role[] = ['viewer', 'technician', 'admin'];
const RANK: Record<Role, number> = { viewer: 0, technician: 1, admin: 2 };
const SOME_ID = '00000000-0000-4000-8000-000000000000';

interface RouteEntry {
  method: string;
  path: string;
  minRole: Role;
}

/** The route table, read from the app's own OpenAPI document (`x-min-role` on each operation). */
async function routeTable(get: (path: string) => Promise<{ body: { paths: Record<string, Record<string, { 'x-min-role'?: Role }>> } }>) {
  const doc = (await get('/openapi.json')).body;
  const entries: RouteEntry[] = [];
  for (const [path, ops] of Object.entries(doc.paths)) {
    for (const [method, op] of Object.entries(ops)) {
      if (op['x-min-role']) entries.push({ method: method.toUpperCase(), path: path.replace(/\{[^}]+\}/g, SOME_ID), minRole: op['x-min-role'] });
    }
  }
  return entries;
}

describe('access by role, from the route table', () => {
  it('documents a minimum role for every /v1 route', () =>
    inLab(async ({ anonymous }) => {
      const doc = (await anonymous.get('/openapi.json')).body;
      const v1 = Object.entries(doc.paths as Record<string, Record<string, { 'x-min-role'?: string }>>).filter(([p]) => p.startsWith('/v1/'));
      expect(v1.length).toBeGreaterThan(10);
      for (const [path, ops] of v1) for (const [method, op] of Object.entries(ops)) expect(op['x-min-role'], `${method} ${path}`).toBeDefined();
    }));

  it('refuses every route without a key, and each role what it may not do', () =>
    inLab(async (lab) => {
      const routes = await routeTable(lab.anonymous.get);
      const writes = routes.filter((r) => r.method !== 'GET');
      expect(writes.length).toBeGreaterThan(5);
      for (const route of routes) {
        const none = await lab.anonymous.send(route.method, route.path, { body: '{}', headers: { 'content-type': 'application/json' } });
        expect(none.status, `${route.method} ${route.path} without a key`).toBe(401);
        for (const role of ROLES) {
          const reply = await lab[role].send(route.method, route.path, { body: '{}', headers: { 'content-type': 'application/json' } });
          const label = `${route.method} ${route.path} as ${role}`;
          if (RANK[role] < RANK[route.minRole]) expect(reply.status, label).toBe(403);
          else {
            expect([401, 403], label).not.toContain(reply.status);
            expect(reply.status, label).toBeLessThan(500);
          }
        }
      }
    }));

  it('refuses a revoked key at once, and never lists a secret', () =>
    inLab(async ({ app, admin }) => {
      const issued = await admin.post('/v1/keys', { label: 'temporary', role: 'viewer' });
      expect(issued.status).toBe(201);
      expect(issued.body.secret).toMatch(/^flk_/);
      const holder = clientFor(app, issued.body.secret);
      expect((await holder.get('/v1/whoami')).body.role).toBe('viewer');
      const keys = await admin.get('/v1/keys');
      expect(JSON.stringify(keys.body)).not.toContain(issued.body.secret);
      expect((await admin.post(`/v1/keys/${issued.body.id}/revoke`)).status).toBe(200);
      expect((await holder.get('/v1/whoami')).status).toBe(401);
    }));

  it('answers health and docs without a key', () =>
    inLab(async ({ anonymous }) => {
      expect((await anonymous.get('/health')).body).toEqual({ status: 'ok' });
      const docs = await anonymous.send('GET', '/docs');
      expect(docs.status).toBe(200);
      expect(docs.text).toContain('/v1/sites/{id}/readings');
      const openapi = await anonymous.get('/openapi.json');
      expect(openapi.body.openapi).toBe('3.1.0');
    }));
});
