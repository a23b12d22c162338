import { sql } from 'drizzle-orm';
import type { Db } from '../../Db.ts';
import type { Actor } from '../Actor.ts';
import type { ParsedOvenLog } from './parseOvenLogCsv.ts';

// Chunks keep each jsonb parameter at well under a megabyte while still amortising round trips.
const CHUNK_ROWS = 5000;

/**
 * Writes the samples with one statement per chunk: they travel as ONE jsonb parameter read by
 * jsonb_to_recordset, because a parameter per value fails past 1,664 of them on the embedded
 * database and is several times slower on the server.
 */
export async function insertOvenLogSamples(db: Db, actor: Actor, logId: string, log: ParsedOvenLog): Promise<void> {
  for (let start = 0; start < log.elapsedH.length; start += CHUNK_ROWS) {
    const chunk = [];
    for (let i = start; i < Math.min(start + CHUNK_ROWS, log.elapsedH.length); i += 1) {
      chunk.push({ seq: i, elapsed_h: log.elapsedH[i], observed_at: log.observedAt[i]?.toISOString() ?? null, temperature_c: log.temperatureC[i] });
    }
    await db.execute(sql`
      insert into oven_log_samples (lab_id, log_id, seq, elapsed_h, observed_at, temperature_c)
      select ${actor.labId}::uuid, ${logId}::uuid, x.seq, x.elapsed_h, x.observed_at, x.temperature_c
      from jsonb_to_recordset(${JSON.stringify(chunk)}::jsonb) as x(seq integer, elapsed_h float8, observed_at timestamptz, temperature_c float8)`);
  }
}
