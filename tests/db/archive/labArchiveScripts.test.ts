import { mkdir, mkdtemp, readFile, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { archiveLines } from '../../support/archiveBytes.ts';
import { demoArchive } from '../../support/demoArchive.ts';
import { runScript } from '../../support/runScript.ts';

let dir: string;
beforeAll(async () => {
  dir = await mkdtemp(join(tmpdir(), 'fl-scripts-'));
});
afterAll(async () => {
  await rm(dir, { recursive: true, force: true });
});

const parts = (lines: string[]) => lines.filter((l) => !l.startsWith('@open ') && !l.startsWith('@manifest '));

// Both scripts run here on embedded folders of their own; on the server project they would
// commit a lab into the database the other test files share, so they run in one project only.
describe.skipIf(Boolean(inject('serverDatabaseUrl')))('lab:export and lab:import scripts', () => {
  it('move a lab into a new embedded folder and back out unchanged, printing a fresh admin key', async () => {
    const demo = await demoArchive();
    const archive = join(dir, 'demo.flarchive');
    await writeFile(archive, demo.bytes);
    const target = join(dir, 'target');
    const imported = await runScript('scripts/labImport.ts', ['--in', archive], { DATA_DIR: target });
    expect(imported.stderr).toMatch(/lab:import {2}restore {2}readings {2}\d+\/\d+ rows {2}\(100% of the lab\)/);
    expect(imported.code).toBe(0);
    expect(imported.stdout).toMatch(new RegExp(`Imported lab ".+" \\(${demo.labId}\\)`));
    expect(imported.stdout).toMatch(/admin {6}flk_[\w-]{43}/);

    const out = join(dir, 'again.flarchive');
    const exported = await runScript('scripts/labExport.ts', ['--out', out], { DATA_DIR: target });
    expect(exported.code).toBe(0);
    expect(parts(archiveLines(await readFile(out)))).toEqual(parts(archiveLines(demo.bytes)));

    const twice = await runScript('scripts/labImport.ts', ['--in', archive], { DATA_DIR: target });
    expect(twice.code).toBe(1);
    expect(twice.stderr).toMatch(/is already in this database/);
  }, 240_000);

  it('refuse a data folder another live process holds, saying how to go through the service', async () => {
    const held = join(dir, 'held');
    await mkdir(held, { recursive: true });
    // This test process is alive, so its pid in the lock is a live holder.
    await writeFile(join(held, 'fringe-ledger.lock'), String(process.pid));
    const out = join(dir, 'never.flarchive');
    const refused = await runScript('scripts/labExport.ts', ['--out', out], { DATA_DIR: held });
    expect(refused.code).toBe(1);
    expect(refused.stderr).toMatch(new RegExp(`is in use by process ${process.pid}`));
    expect(refused.stderr).toMatch(/GET \/v1\/lab\/archive/);
    const importRefused = await runScript('scripts/labImport.ts', ['--in', out], { DATA_DIR: held });
    expect(importRefused.code).toBe(1);
    expect(importRefused.stderr).toMatch(/in use by process/);
  }, 60_000);
});
