import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { PGlite } from '@electric-sql/pglite';
import { drizzle as drizzlePglite } from 'drizzle-orm/pglite';
import { drizzle as drizzlePostgres } from 'drizzle-orm/postgres-js';
import postgres from 'postgres';
import type { Db } from './Db.ts';
import * as schema from './schema/index.ts';
import { takeDataDirLock } from './takeDataDirLock.ts';

export interface DatabaseHandle {
  db: Db;
  kind: 'embedded' | 'server';
  /** Where the data lives: the folder (embedded) or the server URL without password. */
  location: string;
  close(): Promise<void>;
}

export interface OpenDatabaseOptions {
  databaseUrl?: string | undefined;
  dataDir: string;
  /** Connections in the server pool; ignored for the embedded database. */
  poolSize?: number;
}

/**
 * Opens the server database when a URL is given, else the embedded PostgreSQL (PGlite) in
 * dataDir. The embedded folder is locked to this process because PGlite has no lock of its
 * own and a second opener can corrupt it.
 */
export async function openDatabase(options: OpenDatabaseOptions): Promise<DatabaseHandle> {
  if (options.databaseUrl) {
    const client = postgres(options.databaseUrl, {
      max: options.poolSize ?? 10,
      onnotice: () => {},
      connect_timeout: 10,
    });
    const url = new URL(options.databaseUrl);
    url.password = '';
    return {
      db: drizzlePostgres(client, { schema }) as unknown as Db,
      kind: 'server',
      location: url.toString(),
      close: () => client.end({ timeout: 5 }),
    };
  }
  mkdirSync(options.dataDir, { recursive: true });
  const releaseLock = takeDataDirLock(options.dataDir);
  try {
    const client = await PGlite.create(join(options.dataDir, 'pgdata'));
    return {
      db: drizzlePglite(client, { schema }) as unknown as Db,
      kind: 'embedded',
      location: options.dataDir,
      close: async () => {
        await client.close();
        releaseLock();
      },
    };
  } catch (error) {
    releaseLock();
    throw error;
  }
}
