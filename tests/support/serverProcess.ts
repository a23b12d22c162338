import { type ChildProcess, spawn } from 'node:child_process';
import { once } from 'node:events';

export interface ServerProcess {
  url: string;
  /** The keys the first start printed, by role (empty when the database already had a lab). */
  keys: Record<string, string>;
  child: ChildProcess;
  /** Everything the process wrote to stdout and stderr so far. */
  output(): string;
  /** Resolves with the exit code (or the signal) once the process has ended. */
  exited: Promise<number | string>;
  stop(signal?: NodeJS.Signals): Promise<number | string>;
}

const ROOT = new URL('../../', import.meta.url).pathname;

/**
 * Starts the real service (node --import tsx api/server.ts, never through npx, so a signal
 * reaches it) on a free loopback port and waits until it listens.
 */
export async function startServer(env: Record<string, string>, timeoutMs = 60_000): Promise<ServerProcess> {
  const child = spawn(process.execPath, ['--import', 'tsx', 'api/server.ts'], {
    cwd: ROOT,
    env: { ...process.env, HOST: '127.0.0.1', PORT: '0', ...env },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let output = '';
  child.stdout!.on('data', (chunk) => (output += chunk));
  child.stderr!.on('data', (chunk) => (output += chunk));
  const exited = once(child, 'exit').then(([code, signal]) => (code ?? signal) as number | string);
  const started = Date.now();
  while (!/listening on (http:\/\/\S+)/.test(output)) {
    if (child.exitCode !== null || child.signalCode !== null) throw new Error(`the service ended before listening:\n${output}`);
    if (Date.now() - started > timeoutMs) {
      child.kill('SIGKILL');
      throw new Error(`the service did not listen within ${timeoutMs} ms:\n${output}`);
    }
    await new Promise((resolve) => setTimeout(resolve, 50));
  }
  // The first-start key lines follow the listening line in the same callback.
  await new Promise((resolve) => setTimeout(resolve, 100));
  const url = /listening on (http:\/\/\S+)/.exec(output)![1]!;
  const keys = Object.fromEntries([...output.matchAll(/^\s+(admin|technician|viewer)\s+(flk_\S+)/gm)].map((m) => [m[1]!, m[2]!]));
  return {
    url,
    keys,
    child,
    output: () => output,
    exited,
    stop: async (signal = 'SIGTERM') => {
      if (child.exitCode === null && child.signalCode === null) child.kill(signal);
      return exited;
    },
  };
}
