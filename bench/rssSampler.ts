import { readFileSync } from 'node:fs';

/** Resident set size of a process in MiB, from /proc (Linux). */
function rssMiB(pid: number): number {
  const line = readFileSync(`/proc/${pid}/status`, 'utf8').split('\n').find((l) => l.startsWith('VmRSS:'));
  return Number(line?.replace(/\D+/g, '') ?? 0) / 1024;
}

/** Samples a process's RSS every `everyMs` until stopped; returns the samples in order. */
export function sampleRss(pid: number, everyMs = 1000): { stop(): number[] } {
  const samples: number[] = [rssMiB(pid)];
  const timer = setInterval(() => samples.push(rssMiB(pid)), everyMs);
  return {
    stop: () => {
      clearInterval(timer);
      return samples;
    },
  };
}
