import { writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { PGlite } from '@electric-sql/pglite';
import { drizzle } from 'drizzle-orm/pglite';
import { migrate } from 'drizzle-orm/pglite/migrator';
import postgres from 'postgres';
import type { TestProject } from 'vitest/node';
import { MIGRATIONS_FOLDER, migrateDatabase } from '../../db/migrateDatabase.ts';
import { openDatabase } from '../../db/openDatabase.ts';

declare module 'vitest' {
  export interface ProvidedContext {
    serverDatabaseUrl: string;
    embeddedDumpPath: string;
  }
}

/** A migrated embedded database, dumped once so each test file starts from it in about 0.5 s. */
async function prepareEmbedded(project: TestProject): Promise<() => Promise<void>> {
  const client = await PGlite.create();
  await migrate(drizzle(client), { migrationsFolder: MIGRATIONS_FOLDER });
  const dump = await client.dumpDataDir('none');
  await client.close();
  const path = join(tmpdir(), `fringe-ledger-test-${process.pid}.tar`);
  await writeFile(path, Buffer.from(await dump.arrayBuffer()));
  project.provide('embeddedDumpPath', path);
  return async () => {};
}

/**
 * A fresh database on the server (TEST_DATABASE_URL, else a testcontainers PostgreSQL),
 * migrated once and dropped at the end, so runs never see each other's rows.
 */
async function prepareServer(project: TestProject): Promise<() => Promise<void>> {
  let baseUrl = process.env.TEST_DATABASE_URL;
  let stopContainer = async () => {};
  if (!baseUrl) {
    const { PostgreSqlContainer } = await import('@testcontainers/postgresql');
    const container = await new PostgreSqlContainer('postgres:15-alpine').start();
    baseUrl = container.getConnectionUri();
    stopContainer = async () => void (await container.stop());
  }
  const name = `fl_test_${Date.now()}_${process.pid}`;
  const admin = postgres(baseUrl, { max: 1, onnotice: () => {} });
  await admin.unsafe(`create database ${name}`);
  const url = new URL(baseUrl);
  url.pathname = `/${name}`;
  const handle = await openDatabase({ databaseUrl: url.toString(), dataDir: '' });
  await migrateDatabase(handle);
  await handle.close();
  project.provide('serverDatabaseUrl', url.toString());
  return async () => {
    await admin.unsafe(`drop database if exists ${name} with (force)`);
    await admin.end();
    await stopContainer();
  };
}

export default async function setup(project: TestProject): Promise<() => Promise<void>> {
  return project.name === 'api-server' ? prepareServer(project) : prepareEmbedded(project);
}
