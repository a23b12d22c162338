import { fileURLToPath } from 'node:url';
import { migrate as migratePglite } from 'drizzle-orm/pglite/migrator';
import { migrate as migratePostgres } from 'drizzle-orm/postgres-js/migrator';
import type { DatabaseHandle } from './openDatabase.ts';

export const MIGRATIONS_FOLDER = fileURLToPath(new URL('./migrations', import.meta.url));

/** Applies the same drizzle-kit migrations on either driver. */
export async function migrateDatabase(handle: DatabaseHandle): Promise<void> {
  const config = { migrationsFolder: MIGRATIONS_FOLDER };
  // Both migrators accept the handle's drizzle instance; the casts only pick the driver's type.
  if (handle.kind === 'embedded') await migratePglite(handle.db as never, config);
  else await migratePostgres(handle.db as never, config);
}
