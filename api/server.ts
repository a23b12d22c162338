import { serve } from '@hono/node-server';
import { migrateDatabase } from '../db/migrateDatabase.ts';
import { openDatabase } from '../db/openDatabase.ts';
import { bootstrapEmptyDatabase } from '../seed/bootstrapEmptyDatabase.ts';
import { createApp } from './createApp.ts';
import { type AppConfig, parseEnv } from './env.ts';

async function startDatabase(config: AppConfig) {
  try {
    const handle = await openDatabase({ databaseUrl: config.DATABASE_URL, dataDir: config.DATA_DIR, poolSize: config.DB_POOL_SIZE });
    await migrateDatabase(handle);
    return { handle, firstStart: await bootstrapEmptyDatabase(handle.db, config.LOAD_DEMO) };
  } catch (error) {
    console.error(`fringe-ledger could not start: ${(error as Error).message}`);
    process.exit(1);
  }
}

let config: AppConfig;
try {
  config = parseEnv(process.env);
} catch (error) {
  console.error((error as Error).message);
  process.exit(1);
}
const { handle, firstStart } = await startDatabase(config);

const app = createApp({ db: handle.db, config });
const server = serve({ fetch: app.fetch, port: config.PORT, hostname: config.HOST }, (info) => {
  const address = `http://${info.address}:${info.port}`;
  console.log(`fringe-ledger listening on ${address}`);
  console.log(`  database: ${handle.kind === 'embedded' ? `embedded PostgreSQL in ${handle.location}` : handle.location}`);
  console.log(`  API documentation: ${address}/docs   OpenAPI: ${address}/openapi.json`);
  if (firstStart) {
    console.log(`\nFirst start: created lab "${firstStart.labName}". These keys are shown once and stored only as hashes:`);
    for (const key of firstStart.keys) console.log(`  ${key.role.padEnd(10)} ${key.secret}   (${key.label})`);
    console.log(`\nTry: curl -H "Authorization: Bearer <admin key>" ${address}/v1/models`);
  } else {
    console.log('  authenticate with "Authorization: Bearer <key>" using a key of your lab (created on first start or by npm run seed)');
  }
});

let stopping = false;
async function shutdown(signal: string): Promise<void> {
  if (stopping) return;
  stopping = true;
  console.log(`${signal}: finishing in-flight requests, then closing the database`);
  server.close(async () => {
    await handle.close();
    process.exit(0);
  });
  setTimeout(() => process.exit(1), 15_000).unref();
}
process.on('SIGINT', () => void shutdown('SIGINT'));
process.on('SIGTERM', () => void shutdown('SIGTERM'));
