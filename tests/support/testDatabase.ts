import { readFile } from 'node:fs/promises';
import { PGlite } from '@electric-sql/pglite';
import { drizzle as drizzlePglite } from 'drizzle-orm/pglite';
import { inject } from 'vitest';
import type { Db } from '../../db/Db.ts';
import { openDatabase } from '../../db/openDatabase.ts';
import * as schema from '../../db/schema/index.ts';

let shared: Promise<Db> | undefined;

async function open(): Promise<Db> {
  const serverUrl = inject('serverDatabaseUrl');
  if (serverUrl) return (await openDatabase({ databaseUrl: serverUrl, dataDir: '', poolSize: 4 })).db;
  const dump = await readFile(inject('embeddedDumpPath'));
  const client = await PGlite.create({ loadDataDir: new Blob([dump]) });
  return drizzlePglite(client, { schema }) as unknown as Db;
}

/** The test file's database: the server database or an embedded one restored from the dump. */
export function testDatabase(): Promise<Db> {
  shared ??= open();
  return shared;
}
