import { existsSync } from 'node:fs';
import { defineConfig } from 'vitest/config';

/** A container engine counts only when testcontainers can reach one (it fails fast otherwise). */
async function containerEngineReachable(): Promise<boolean> {
  try {
    const { getContainerRuntimeClient } = await import('testcontainers');
    await getContainerRuntimeClient();
    return true;
  } catch {
    return false;
  }
}

// The same integration suite runs on the embedded database and, when one is reachable, on a
// PostgreSQL server (TEST_DATABASE_URL, else a testcontainers container).
const serverReachable = Boolean(process.env.TEST_DATABASE_URL) || (await containerEngineReachable());
const integration = (name: string) => ({
  test: {
    name,
    include: ['tests/api/**/*.test.ts', 'tests/db/**/*.test.ts', 'tests/seed/**/*.test.ts'],
    globalSetup: ['tests/support/globalSetup.ts'],
    testTimeout: 60_000,
    hookTimeout: 120_000,
  },
});

export default defineConfig({
  test: {
    projects: [
      { test: { name: 'unit', include: ['tests/src/**/*.test.ts'], testTimeout: 30_000 } },
      integration('api-embedded'),
      ...(serverReachable ? [integration('api-server')] : []),
      // Faults start the real service as a child process against databases of their own on the
      // server, so they need TEST_DATABASE_URL; they take minutes, so npm run bench:faults runs
      // them (RUN_FAULTS) and npm test does not. One file at a time keeps their timing honest.
      ...(process.env.TEST_DATABASE_URL && process.env.RUN_FAULTS ? [{ test: { name: 'faults', include: ['tests/faults/**/*.test.ts'], testTimeout: 120_000, hookTimeout: 120_000, fileParallelism: false } }] : []),
      // Browser tests of the lab pages run only where the system Chromium is installed.
      ...(existsSync('/usr/bin/chromium') ? [{ test: { name: 'e2e', include: ['tests/e2e/**/*.test.ts'], testTimeout: 120_000, hookTimeout: 240_000 } }] : []),
    ],
  },
});
