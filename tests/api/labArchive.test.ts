import { describe, expect, it } from 'vitest';
import { archiveLines } from '../support/archiveBytes.ts';
import { countRows } from '../support/countRows.ts';
import { demoArchive } from '../support/demoArchive.ts';
import { inLab } from '../support/inLab.ts';

const gzip = { 'content-type': 'application/gzip' };

describe('lab archive routes', () => {
  it('streams the caller\'s lab as an archive to admins only', () =>
    inLab(async ({ app, keys, technician, viewer, make }) => {
      await make.model();
      const reply = await app.request('/v1/lab/archive', { headers: { authorization: `Bearer ${keys.admin}` } });
      expect(reply.status).toBe(200);
      expect(reply.headers.get('content-type')).toBe('application/gzip');
      expect(reply.headers.get('content-disposition')).toMatch(/attachment; filename="lab-.*\.flarchive"/);
      const manifest = JSON.parse(archiveLines(new Uint8Array(await reply.arrayBuffer())).at(-1)!.replace(/^@manifest /, ''));
      expect(manifest.parts.find((p: { name: string }) => p.name === 'models').rows).toBe(1);
      expect((await technician.get('/v1/lab/archive')).status).toBe(403);
      expect((await viewer.get('/v1/lab/archive')).status).toBe(403);
      expect((await technician.send('POST', '/v1/lab/archive/import', { body: new Uint8Array([1]), headers: gzip })).status).toBe(403);
    }));

  it('restores an archive into an empty lab, then refuses a second one (409)', async () => {
    const demo = await demoArchive();
    await inLab(async ({ admin }) => {
      const reply = await admin.send('POST', '/v1/lab/archive/import', { body: new Uint8Array(demo.bytes), headers: gzip });
      expect(reply.status).toBe(201);
      expect(reply.body.archivedLabId).toBe(demo.labId);
      const models = await admin.get('/v1/models?limit=200');
      expect(models.body.items.length).toBeGreaterThan(3);
      const again = await admin.send('POST', '/v1/lab/archive/import', { body: new Uint8Array(demo.bytes), headers: gzip });
      expect(again.status).toBe(409);
      expect(again.body.detail).toMatch(/without records; this lab has .*models/);
    });
  });

  it('refuses an archive whose records already exist in the database, and writes nothing', () =>
    inLab(async ({ db, make, otherLab, app, keys }) => {
      await make.model();
      const exported = await app.request('/v1/lab/archive', { headers: { authorization: `Bearer ${keys.admin}` } });
      const bytes = new Uint8Array(await exported.arrayBuffer());
      expect(archiveLines(bytes)[0]).toMatch(/^@open /);
      const other = await otherLab();
      const before = await countRows(db);
      const reply = await other.admin.send('POST', '/v1/lab/archive/import', { body: bytes, headers: gzip });
      expect(reply.status).toBe(409);
      expect(reply.body.detail).toMatch(/already exist in this database/);
      expect(await countRows(db)).toEqual(before);
    }));
});
