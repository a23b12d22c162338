import { type ChildProcess, spawn } from 'node:child_process';

export interface ScriptResult {
  code: number | null;
  stdout: string;
  stderr: string;
}

/** Runs a TypeScript entry point in its own Node process, as `node --import tsx`, and waits. */
export function runScript(path: string, args: string[], env: Record<string, string>): Promise<ScriptResult> {
  const child = startScript(path, args, env);
  let stdout = '';
  let stderr = '';
  child.stdout!.on('data', (d: Buffer) => (stdout += d.toString()));
  child.stderr!.on('data', (d: Buffer) => (stderr += d.toString()));
  return new Promise((resolve, reject) => {
    child.on('error', reject);
    child.on('close', (code) => resolve({ code, stdout, stderr }));
  });
}

/** Starts it without waiting, for a test that watches its output and stops it. */
export function startScript(path: string, args: string[], env: Record<string, string>): ChildProcess {
  const { DATABASE_URL: _url, ...inherited } = process.env;
  return spawn(process.execPath, ['--import', 'tsx', path, ...args], { env: { ...inherited, ...env }, stdio: ['ignore', 'pipe', 'pipe'] });
}
