import { count, eq } from 'drizzle-orm';
import type { Db } from '../../db/Db.ts';
import { readingImports, readings } from '../../db/schema/index.ts';
import type { Client } from '../support/client.ts';
import type { Factories } from '../support/factories.ts';

/** A model with the given code and sites with the given labels, as a spreadsheet names them. */
export async function modelWithSites(make: Factories, code: string, labels: string[]) {
  const model = await make.model({ code });
  const sites: Record<string, { id: string }> = {};
  for (const label of labels) sites[label] = await make.site({ modelId: model.id, label });
  return { model, sites };
}

/** Readings and import records of a lab, to show that a refused file wrote nothing. */
export async function storedCounts(db: Db, labId: string) {
  const [r] = await db.select({ n: count() }).from(readings).where(eq(readings.labId, labId));
  const [i] = await db.select({ n: count() }).from(readingImports).where(eq(readingImports.labId, labId));
  return { readings: r!.n, imports: i!.n };
}

export const postCsv = (client: Client, csv: string | Uint8Array<ArrayBuffer>, headers: Record<string, string> = {}) =>
  client.send('POST', '/v1/readings/import', { body: csv, headers: { 'content-type': 'text/csv', ...headers } });

export const csvOf = (lines: string[]) => `${lines.join('\n')}\n`;
