import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { factoriesFor } from '../support/factories.ts';
import { httpClient } from '../support/httpClient.ts';
import { countOf, readingFile, uploadImport, whenWriting } from '../support/importUpload.ts';
import { createServerDatabase, type ServerDatabase } from '../support/serverDatabase.ts';
import { type ServerProcess, startServer } from '../support/serverProcess.ts';

const ROWS = 20_000;
let database: ServerDatabase;
let server: ServerProcess;

beforeAll(async () => {
  database = await createServerDatabase(process.env.TEST_DATABASE_URL!);
}, 120_000);

afterAll(async () => {
  await server?.stop('SIGKILL');
  await database?.drop();
});

describe('stopping the service', () => {
  it('finishes an import in flight on SIGTERM, then exits 0; and its logs hold no key but the first-start print', async () => {
    server = await startServer({ DATABASE_URL: database.url, LOAD_DEMO: 'never' });
    const adminKey = server.keys.admin!;
    const admin = httpClient(server.url, adminKey);
    const issued = (await admin.post('/v1/keys', { label: 'bench tablet', role: 'technician' })).body.secret as string;
    const site = await factoriesFor(admin).site();
    expect((await httpClient(server.url, `${issued}x`).get('/v1/whoami')).status).toBe(401);
    const before = await countOf(database.sql, 'readings');
    const pending = uploadImport(server.url, issued, readingFile(site.id, ROWS), { idempotencyKey: 'term-1' });
    await whenWriting(database.sql);
    const exited = server.stop('SIGTERM');
    const reply = await pending;
    expect(reply.status, reply.text).toBe(201);
    expect(await exited).toBe(0);
    expect(await countOf(database.sql, 'readings')).toBe(before + ROWS);
    const output = server.output();
    expect(output).toMatch(/SIGTERM: finishing in-flight requests/);
    expect(output.split(adminKey).length - 1).toBe(1);
    expect(output).not.toContain(issued);
    expect(output.match(/flk_[A-Za-z0-9_-]{20,}/g)).toEqual([adminKey]);
  }, 120_000);
});
