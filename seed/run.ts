import { migrateDatabase } from '../db/migrateDatabase.ts';
import { openDatabase } from '../db/openDatabase.ts';
import { parseEnv } from '../api/env.ts';
import { loadDemoScenario } from './loadDemoScenario.ts';

// npm run seed: adds a fresh copy of the demo lab and prints its keys once.
try {
  const config = parseEnv(process.env);
  const handle = await openDatabase({ databaseUrl: config.DATABASE_URL, dataDir: config.DATA_DIR });
  await migrateDatabase(handle);
  const started = Date.now();
  const demo = await loadDemoScenario(handle.db);
  console.log(`Loaded "${demo.labName}" (lab ${demo.labId}) in ${Date.now() - started} ms. Keys, shown once:`);
  for (const key of demo.keys) console.log(`  ${key.role.padEnd(10)} ${key.secret}   (${key.label})`);
  await handle.close();
} catch (error) {
  console.error(`npm run seed: ${(error as Error).message}`);
  process.exitCode = 1;
}
