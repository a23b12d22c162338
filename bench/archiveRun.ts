import { createReadStream, createWriteStream } from 'node:fs';
import { stat } from 'node:fs/promises';
import { Readable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import { sql } from 'drizzle-orm';
import { importLabArchive } from '../db/archive/importLabArchive.ts';
import { labArchiveStream } from '../db/archive/labArchiveStream.ts';
import type { Db } from '../db/Db.ts';
import { migrateDatabase } from '../db/migrateDatabase.ts';
import { openDatabase } from '../db/openDatabase.ts';
import { createLab } from '../db/operations/createLab.ts';
import { createBatch } from '../db/operations/materials/createBatch.ts';
import { createModel } from '../db/operations/models/createModel.ts';
import { rowsOf } from '../db/rowsOf.ts';

// One measurement in a process of its own, so its peak RSS is its own:
//   archiveRun.ts export <databaseUrl | dataDir> <readings> <file>   builds a lab, exports it
//   archiveRun.ts import <databaseUrl | dataDir> <file>              imports into a new lab
const [mode, where, ...rest] = process.argv.slice(2);
const isUrl = where!.startsWith('postgres');
const handle = await openDatabase(isUrl ? { databaseUrl: where, dataDir: '' } : { dataDir: where! });
await migrateDatabase(handle);

async function buildLab(db: Db, readings: number): Promise<string> {
  const lab = await createLab(db, `archive bench ${readings}`);
  const actor = { labId: lab.labId, keyId: lab.adminKey.id, role: 'admin' as const };
  const [material] = rowsOf<{ id: string }>(await db.execute(sql`select id from materials where lab_id = ${lab.labId}::uuid and family = 'polycarbonate' limit 1`));
  const batch = await createBatch(db, actor, { code: 'BENCH-1', kind: 'sheet_lot', materialId: material!.id });
  const model = await createModel(db, actor, { code: 'BENCH-M', batchId: batch.id, geometryKind: 'tension_strip', thicknessMm: 6, thicknessUncertaintyMm: 0.02 });
  await db.execute(sql`insert into sites (lab_id, model_id, label, kind, on_free_edge)
    select ${lab.labId}::uuid, ${model.id}::uuid, 'site ' || g, 'interior', false from generate_series(1, 100) g`);
  // One in a hundred readings is amended, so supersession chains are part of the load.
  await db.execute(sql`with s as (select array_agg(id order by label) as ids from sites where lab_id = ${lab.labId}::uuid)
    insert into readings (lab_id, site_id, stage, observed_at, operator, wavelength_nm, method, raw_inputs, sign, fringe_order, fringe_order_uncertainty, retardation_nm, notes)
    select ${lab.labId}::uuid, s.ids[1 + g % 100], 'before_load', timestamptz '2026-01-01 00:00Z' + g * interval '1 minute', 'bench operator', 577, 'whole_order',
      jsonb_build_object('method', 'whole_order', 'wholeOrder', g % 7), 'unknown', g % 7, 0.05, (g % 7) * 577, case when g % 10 = 0 then 'edge chipped at the corner' end
    from generate_series(1, ${Math.round(readings * 0.99)}) g, s`);
  await db.execute(sql`insert into readings (lab_id, site_id, stage, observed_at, operator, wavelength_nm, method, raw_inputs, sign, fringe_order, fringe_order_uncertainty, retardation_nm, supersedes_id, amendment_reason)
    select lab_id, site_id, stage, observed_at, operator, wavelength_nm, method, raw_inputs, sign, fringe_order + 0.5, fringe_order_uncertainty, retardation_nm + 288.5, id, 'half order missed'
    from readings where lab_id = ${lab.labId}::uuid order by id limit ${readings - Math.round(readings * 0.99)}`);
  return lab.labId;
}

let peakMiB = 0;
const sampler = setInterval(() => (peakMiB = Math.max(peakMiB, process.memoryUsage().rss / 2 ** 20)), 20);
const result: Record<string, number> = {};
try {
  if (mode === 'export') {
    const labId = await buildLab(handle.db, Number(rest[0]));
    global.gc?.();
    result.rssBeforeMiB = process.memoryUsage().rss / 2 ** 20;
    peakMiB = result.rssBeforeMiB;
    const started = performance.now();
    await pipeline(Readable.fromWeb(labArchiveStream(handle.db, labId) as never), createWriteStream(rest[1]!));
    result.seconds = (performance.now() - started) / 1000;
    result.fileMiB = (await stat(rest[1]!)).size / 2 ** 20;
  } else {
    result.rssBeforeMiB = process.memoryUsage().rss / 2 ** 20;
    peakMiB = result.rssBeforeMiB;
    const started = performance.now();
    const summary = await importLabArchive(handle.db, { newLab: true }, createReadStream(rest[0]!));
    result.seconds = (performance.now() - started) / 1000;
    result.rows = summary.totalRows;
  }
  result.peakRssMiB = peakMiB;
} finally {
  clearInterval(sampler);
  await handle.close();
}
process.stdout.write(`${JSON.stringify(result)}\n`);
