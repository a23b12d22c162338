import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Client } from '../support/client.ts';
import { factoriesFor } from '../support/factories.ts';
import { httpClient } from '../support/httpClient.ts';
import { createServerDatabase, type ServerDatabase } from '../support/serverDatabase.ts';
import { type ServerProcess, startServer } from '../support/serverProcess.ts';

const ROUNDS = 12;
let database: ServerDatabase;
let server: ServerProcess;
let technicians: [Client, Client];
let siteId: string;

const amendment = (who: string) => ({ stage: 'before_load', observedAt: '2026-11-21T14:05:00Z', operator: who, wavelengthNm: 577, reading: { method: 'direct', fringeOrder: 0.2 }, reason: `${who} corrects the angle` });

beforeAll(async () => {
  database = await createServerDatabase(process.env.TEST_DATABASE_URL!);
  server = await startServer({ DATABASE_URL: database.url, LOAD_DEMO: 'never', DB_POOL_SIZE: '10' });
  const admin = httpClient(server.url, server.keys.admin);
  const keys = await Promise.all(['A. Ahn', 'B. Berg'].map(async (label) => (await admin.post('/v1/keys', { label, role: 'technician' })).body.secret as string));
  technicians = [httpClient(server.url, keys[0]), httpClient(server.url, keys[1])];
  siteId = (await factoriesFor(admin).site()).id;
}, 120_000);

afterAll(async () => {
  await server?.stop('SIGKILL');
  await database?.drop();
});

describe('two technicians amending the same reading at the same moment', () => {
  it.each([
    ['with If-Match', true],
    ['without If-Match', false],
  ])('%s: exactly one wins each time, the other gets 409 or 412 and nothing half-written', async (label, withIfMatch) => {
    const outcomes = new Map<number, number>();
    for (let round = 0; round < ROUNDS; round++) {
      const reading = await factoriesFor(technicians[0]).reading(siteId);
      const etag = (await technicians[0].get(`/v1/readings/${reading.id}`)).headers.get('etag')!;
      const headers: Record<string, string> = withIfMatch ? { 'if-match': etag } : {};
      const replies = await Promise.all(technicians.map((t, i) => t.post(`/v1/readings/${reading.id}/amendments`, amendment(i === 0 ? 'A. Ahn' : 'B. Berg'), headers)));
      const statuses = replies.map((r) => r.status).sort();
      for (const s of statuses) outcomes.set(s, (outcomes.get(s) ?? 0) + 1);
      expect(statuses.filter((s) => s === 201), JSON.stringify(replies.map((r) => r.text))).toHaveLength(1);
      expect([409, 412]).toContain(statuses.find((s) => s !== 201));
      const successors = await database.sql`select count(*)::int as n from readings where supersedes_id = ${reading.id}`;
      expect(successors[0]!.n).toBe(1);
    }
    expect(outcomes.get(201)).toBe(ROUNDS);
    console.log(`concurrent amendments ${label}: ${ROUNDS} rounds, ${[...outcomes].map(([s, n]) => `${n}×${s}`).join(', ')}`);
  }, 120_000);
});
