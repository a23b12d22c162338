import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Client } from '../support/client.ts';
import { factoriesFor } from '../support/factories.ts';
import { httpClient } from '../support/httpClient.ts';
import { type ServerProcess, startServer } from '../support/serverProcess.ts';
import { type ThrowawayCluster, throwawayCluster } from '../support/throwawayCluster.ts';

let cluster: ThrowawayCluster;
let server: ServerProcess;
let admin: Client;
let siteId: string;

const reading = { stage: 'before_load', observedAt: '2026-11-21T14:05:00Z', operator: 'A. Ahn', wavelengthNm: 577, reading: { method: 'direct', fringeOrder: 0.1 } };

beforeAll(async () => {
  cluster = await throwawayCluster();
  cluster.start();
  server = await startServer({ DATABASE_URL: cluster.url, LOAD_DEMO: 'never' });
  admin = httpClient(server.url, server.keys.admin);
  siteId = (await factoriesFor(admin).site()).id;
}, 120_000);

afterAll(async () => {
  await server?.stop('SIGKILL');
  cluster?.remove();
});

describe('the database restarting under the running service', () => {
  it('answers 503 with Retry-After while it is down, and serves again after, in the same process', async () => {
    expect((await admin.get('/v1/whoami')).status).toBe(200);
    cluster.stop();
    for (const attempt of [() => admin.get('/v1/models'), () => admin.post(`/v1/sites/${siteId}/readings`, reading), () => admin.get(`/v1/sites/${siteId}`)]) {
      const reply = await attempt();
      expect(reply.status, reply.text).toBe(503);
      expect(reply.body.code).toBe('unavailable');
      expect(Number(reply.headers.get('retry-after'))).toBeGreaterThan(0);
    }
    const pid = server.child.pid;
    cluster.start();
    const restartedAt = Date.now();
    let status = 0;
    while (status !== 200 && Date.now() - restartedAt < 30_000) {
      status = (await admin.get('/v1/models')).status;
      if (status !== 200) await new Promise((resolve) => setTimeout(resolve, 200));
    }
    expect(status).toBe(200);
    expect((await admin.post(`/v1/sites/${siteId}/readings`, reading)).status).toBe(201);
    expect(server.child.pid).toBe(pid);
    expect(server.child.exitCode).toBeNull();
    console.log(`database restart: 503 while down, first 200 ${Date.now() - restartedAt} ms after the database was back, same process`);
  }, 120_000);
});
