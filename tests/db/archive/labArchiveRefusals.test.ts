import { gunzipSync, gzipSync } from 'node:zlib';
import { sql } from 'drizzle-orm';
import { beforeAll, describe, expect, it } from 'vitest';
import { importLabArchive } from '../../../db/archive/importLabArchive.ts';
import { localMigrations } from '../../../db/archive/localMigrations.ts';
import type { Db } from '../../../db/Db.ts';
import { rowsOf } from '../../../db/rowsOf.ts';
import { chunksOf } from '../../support/archiveBytes.ts';
import { countRows } from '../../support/countRows.ts';
import { demoArchive } from '../../support/demoArchive.ts';
import { rewriteArchive } from '../../support/rewriteArchive.ts';
import { rolledBack } from '../../support/rolledBack.ts';
import { testDatabase } from '../../support/testDatabase.ts';

let demo: Awaited<ReturnType<typeof demoArchive>>;
beforeAll(async () => {
  demo = await demoArchive();
});

/** Imports into a new lab and expects a refusal; the database must be exactly as before. */
async function expectRefused(bytes: Uint8Array, message: RegExp): Promise<void> {
  const db = await testDatabase();
  await rolledBack(db, async (tx: Db) => {
    const before = await countRows(tx);
    await expect(importLabArchive(tx, { newLab: true }, chunksOf(bytes))).rejects.toThrow(message);
    expect(await countRows(tx)).toEqual(before);
  });
}

describe('lab archive refusals', () => {
  it('refuses a row changed by one byte, naming its part', async () => {
    const text = gunzipSync(demo.bytes).toString('utf8');
    const at = text.indexOf('"fringe_order": ') + '"fringe_order": '.length;
    const flipped = `${text.slice(0, at)}${text[at] === '9' ? '8' : '9'}${text.slice(at + 1)}`;
    await expectRefused(gzipSync(flipped), /part readings: its SHA-256 does not match its rows/);
  });

  it('refuses a file with one byte flipped in the compressed data, naming where it failed', async () => {
    const damaged = Buffer.from(demo.bytes);
    const at = Math.floor(damaged.length * 0.6);
    damaged[at] = damaged[at]! ^ 0x5a;
    await expectRefused(damaged, /The archive is refused at (part \S+|the opening|the manifest).*Nothing was written/);
  });

  it('refuses a truncated file, naming the part it ends in', async () => {
    await expectRefused(demo.bytes.subarray(0, Math.floor(demo.bytes.length * 0.7)), /refused at part \S+ \(after \d+ of \d+ rows\)|refused at part \S+: .*cut short/);
    const text = gunzipSync(demo.bytes).toString('utf8');
    const cut = text.slice(0, text.indexOf('@end {"name":"readings"'));
    await expectRefused(gzipSync(cut), /refused at part readings \(after \d+ of \d+ rows\): the archive ends here/);
  });

  it('refuses an archive from a newer schema before reading its rows', async () => {
    const newer = rewriteArchive(demo.bytes, ({ opening }) => {
      opening.schema = { migration: '9999_from_the_future', hash: 'f'.repeat(64), migratedAt: opening.schema.migratedAt + 1, migrationCount: 999 };
    });
    await expectRefused(newer, /written by a newer schema \(9999_from_the_future\).*Update this installation/);
  });

  it('restores an archive of an older schema: columns added since take their defaults', async () => {
    const [first] = localMigrations();
    const older = rewriteArchive(demo.bytes, ({ opening, rows }) => {
      opening.schema = { migration: first!.tag, hash: first!.hash, migratedAt: first!.migratedAt, migrationCount: 1 };
      const materials = opening.parts.find((p) => p.name === 'materials')!;
      materials.columns = materials.columns.filter((c) => c !== 'sources');
      for (const row of rows.get('materials')!) delete row.sources;
    });
    const db = await testDatabase();
    await rolledBack(db, async (tx) => {
      const summary = await importLabArchive(tx, { newLab: true }, chunksOf(older));
      expect(summary.schema.archive).toBe(first!.tag);
      expect(summary.schema.upgradedThrough).toEqual(localMigrations().slice(1).map((m) => m.tag));
      const sources = rowsOf<{ s: string }>(await tx.execute(sql`select distinct sources::text as s from materials where lab_id = ${summary.labId}::uuid`));
      expect(sources).toEqual([{ s: '{}' }]);
    });
  });

  it('refuses a column this database does not have, and one it requires that is missing', async () => {
    const extra = rewriteArchive(demo.bytes, ({ opening, rows }) => {
      opening.parts.find((p) => p.name === 'models')!.columns.push('colour_code');
      for (const row of rows.get('models')!) row.colour_code = 'blue';
    });
    await expectRefused(extra, /part models has columns colour_code that this database's models does not have/);
    const missing = rewriteArchive(demo.bytes, ({ opening, rows }) => {
      const models = opening.parts.find((p) => p.name === 'models')!;
      models.columns = models.columns.filter((c) => c !== 'code');
      for (const row of rows.get('models')!) delete row.code;
    });
    await expectRefused(missing, /models requires code, which the archive's part models does not carry/);
  });

  it('refuses the same lab twice', async () => {
    const db = await testDatabase();
    await rolledBack(db, async (tx) => {
      await importLabArchive(tx, { newLab: true }, chunksOf(demo.bytes));
      const before = await countRows(tx);
      await expect(importLabArchive(tx, { newLab: true }, chunksOf(demo.bytes))).rejects.toThrow(/is already in this database/);
      expect(await countRows(tx)).toEqual(before);
    });
  });

  it('points shared rows at this database\'s copy of the same row, keeping the lab\'s own ids', async () => {
    const db = await testDatabase();
    await rolledBack(db, async (tx) => {
      const [shared] = rowsOf<Record<string, unknown>>(await tx.execute(sql`select gen_random_uuid() as id`));
      await tx.execute(sql`insert into annealing_guidance_entries (id, key, title, material_family, catalogue_version, catalogue_position, entry)
        values (${shared!.id}::uuid, 'archive-test.shared-cycle', 'Shared test cycle', 'polycarbonate', 'archive-test-1', 0,
          '{"key": "archive-test.shared-cycle", "title": "Shared test cycle", "peakTemperatureC": 140}')`);
      const summary = await importLabArchive(tx, { newLab: true }, chunksOf(demo.bytes));
      expect(summary.repointedSharedReferences).toBe(3);
      const plans = rowsOf<{ g: string }>(await tx.execute(sql`select distinct guidance_entry_id::text as g from annealing_plans where lab_id = ${summary.labId}::uuid and guidance_key = 'archive-test.shared-cycle'`));
      expect(plans).toEqual([{ g: shared!.id }]);
      const copies = rowsOf<{ n: number }>(await tx.execute(sql`select count(*)::int as n from annealing_guidance_entries where key = 'archive-test.shared-cycle'`));
      expect(copies[0]!.n).toBe(1);
    });
  });
});
