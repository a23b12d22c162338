import { and, eq } from 'drizzle-orm';
import { migrateDatabase } from '../../db/migrateDatabase.ts';
import { openDatabase } from '../../db/openDatabase.ts';
import type { Actor } from '../../db/operations/Actor.ts';
import { createLab } from '../../db/operations/createLab.ts';
import { createBatch } from '../../db/operations/materials/createBatch.ts';
import { createModel } from '../../db/operations/models/createModel.ts';
import { createSite } from '../../db/operations/models/createSite.ts';
import { recordReading } from '../../db/operations/readings/recordReading.ts';
import { materials } from '../../db/schema/index.ts';

// A child process for the crash test: writes readings to an embedded data folder one committed
// transaction at a time, printing each id only after its commit returned, until it is killed.
const dataDir = process.argv[2]!;
const handle = await openDatabase({ dataDir });
await migrateDatabase(handle);
const { db } = handle;
const lab = await createLab(db, 'crash test lab');
const actor: Actor = { labId: lab.labId, keyId: lab.adminKey.id, role: 'admin' };
const [material] = await db.select().from(materials).where(and(eq(materials.labId, lab.labId), eq(materials.family, 'polycarbonate'))).limit(1);
const batch = await createBatch(db, actor, { code: 'CRASH-1', kind: 'sheet_lot', materialId: material!.id });
const model = await createModel(db, actor, { code: 'CRASH-M1', batchId: batch.id, geometryKind: 'tension_strip', thicknessMm: 6, thicknessUncertaintyMm: 0.02 });
const site = await createSite(db, actor, model.id, { label: 'mid-span', kind: 'interior', onFreeEdge: false });
process.stdout.write(`lab ${lab.labId}\n`);
for (let i = 0; ; i++) {
  const reading = await recordReading(db, actor, site.id, {
    stage: 'before_load',
    observedAt: new Date(Date.UTC(2026, 0, 1) + i * 60_000).toISOString(),
    operator: 'crash writer',
    wavelengthNm: 577,
    reading: { method: 'whole_order', wholeOrder: i % 5 },
    sign: 'unknown',
  });
  process.stdout.write(`committed ${reading.id}\n`);
}
