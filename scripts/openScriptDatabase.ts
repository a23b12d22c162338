import { parseEnv } from '../api/env.ts';
import { migrateDatabase } from '../db/migrateDatabase.ts';
import { type DatabaseHandle, openDatabase } from '../db/openDatabase.ts';

/**
 * Opens and migrates the database the service would use (DATABASE_URL, else DATA_DIR), the same
 * way the service does at start. The embedded folder's lock refuses a second process; that
 * message is made plain, with the way round it, because the service is the usual holder.
 *
 * @example
 * const handle = await openScriptDatabase('lab:export'); // embedded PostgreSQL in .data
 */
export async function openScriptDatabase(command: string): Promise<DatabaseHandle> {
  const config = parseEnv(process.env);
  let handle: DatabaseHandle;
  try {
    handle = await openDatabase({ databaseUrl: config.DATABASE_URL, dataDir: config.DATA_DIR, poolSize: 2 });
  } catch (error) {
    const message = (error as Error).message;
    if (/in use by process/.test(message)) {
      throw new Error(`${message}\n${command} needs the embedded data folder to itself. Stop the service, or use its API while it runs (GET /v1/lab/archive, POST /v1/lab/archive/import).`, { cause: error });
    }
    throw error;
  }
  await migrateDatabase(handle);
  process.stderr.write(`${command}: ${handle.kind === 'embedded' ? `embedded database in ${handle.location}` : handle.location}\n`);
  return handle;
}
