import { stringify } from 'csv-stringify/sync';
import { asc, eq } from 'drizzle-orm';
import type { Db } from '../../Db.ts';
import { ovenLogSamples } from '../../schema/index.ts';
import type { Actor } from '../Actor.ts';
import { getOvenLog } from './getOvenLog.ts';

/** The stored samples in the columns the import reads, so an export can be imported again. */
export async function ovenLogSamplesCsv(db: Db, actor: Actor, logId: string): Promise<string> {
  const log = await getOvenLog(db, actor, logId);
  const s = ovenLogSamples;
  const rows = await db.select().from(s).where(eq(s.logId, log.id)).orderBy(asc(s.seq));
  const byTimestamp = log.timeColumn === 'timestamp';
  return stringify(
    rows.map((r) => [byTimestamp ? r.observedAt!.toISOString() : r.elapsedH, r.temperatureC]),
    { header: true, columns: [byTimestamp ? 'timestamp' : 'elapsed_h', 'temperature_c'] },
  );
}
