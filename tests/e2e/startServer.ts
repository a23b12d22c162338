import { type ChildProcess, spawn } from 'node:child_process';
import { mkdtemp, rm } from 'node:fs/promises';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

export interface RunningServer {
  baseUrl: string;
  /** The demo keys the server printed on its first start, by role. */
  keys: Record<string, string>;
  output: () => string;
  stop(): Promise<void>;
}

async function freeLoopbackPort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const probe = createServer();
    probe.once('error', reject);
    probe.listen(0, '127.0.0.1', () => {
      const address = probe.address();
      probe.close(() => (typeof address === 'object' && address ? resolve(address.port) : reject(new Error('no port'))));
    });
  });
}

/**
 * The real server as `npm start` runs it, on a free loopback port with a fresh embedded
 * database, so the browser tests see the demo lab exactly as a new user would.
 */
export async function startServer(startTimeoutMs = 150_000): Promise<RunningServer> {
  const dataDir = await mkdtemp(join(tmpdir(), 'fringe-ledger-e2e-'));
  const port = await freeLoopbackPort();
  const child: ChildProcess = spawn(process.execPath, ['--import', 'tsx', 'api/server.ts'], {
    env: { ...process.env, PORT: String(port), HOST: '127.0.0.1', DATA_DIR: dataDir, DATABASE_URL: '', LOAD_DEMO: 'auto' },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let output = '';
  child.stdout!.on('data', (chunk) => (output += String(chunk)));
  child.stderr!.on('data', (chunk) => (output += String(chunk)));
  const stop = async () => {
    if (child.exitCode === null) {
      const exited = new Promise((resolve) => child.once('exit', resolve));
      child.kill('SIGTERM');
      await Promise.race([exited, new Promise((resolve) => setTimeout(resolve, 10_000))]);
      if (child.exitCode === null) child.kill('SIGKILL');
    }
    await rm(dataDir, { recursive: true, force: true });
  };
  const started = Date.now();
  // The keys are printed after the listening line; wait for the last of them.
  while (!/viewer\s+flk_\S+/.test(output)) {
    if (child.exitCode !== null) throw new Error(`server exited early:\n${output}`);
    if (Date.now() - started > startTimeoutMs) {
      await stop();
      throw new Error(`server did not print its keys in time:\n${output}`);
    }
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
  const keys = Object.fromEntries([...output.matchAll(/^\s+(admin|technician|viewer)\s+(flk_\S+)/gm)].map((m) => [m[1]!, m[2]!]));
  return { baseUrl: `http://127.0.0.1:${port}`, keys, output: () => output, stop };
}
