import { readFileSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';

function isAlive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (error) {
    return (error as NodeJS.ErrnoException).code === 'EPERM';
  }
}

/**
 * Takes the one-process lock on an embedded data folder and returns its release function.
 * A lock left by a dead process is taken over, so a crash never locks the lab out.
 */
export function takeDataDirLock(dataDir: string): () => void {
  const lockPath = join(dataDir, 'fringe-ledger.lock');
  try {
    writeFileSync(lockPath, String(process.pid), { flag: 'wx' });
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code !== 'EEXIST') throw error;
    takeOverStaleLock(lockPath, dataDir);
  }
  return () => rmSync(lockPath, { force: true });
}

function takeOverStaleLock(lockPath: string, dataDir: string): void {
  const holder = Number(readFileSync(lockPath, 'utf8').trim());
  if (Number.isInteger(holder) && holder !== process.pid && isAlive(holder)) {
    throw new Error(
      `The data folder ${dataDir} is in use by process ${holder}. Stop that process first, ` +
        'or work through its API: the embedded database allows one process at a time.',
    );
  }
  writeFileSync(lockPath, String(process.pid));
}
