import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import postgres from 'postgres';

// node --import tsx bench/archive.ts — lab archive export and import at 10k and 100k readings,
// on the server (BENCH_DATABASE_URL, default the machine's own) and on the embedded database.
// Each step runs in a fresh process so its peak RSS belongs to it alone.
const SIZES = (process.env.BENCH_ARCHIVE_SIZES ?? '10000,100000').split(',').map(Number);
const baseUrl = process.env.BENCH_DATABASE_URL ?? 'postgres://postgres@127.0.0.1:5432/postgres';
const work = mkdtempSync(join(tmpdir(), 'fl-archive-bench-'));
const admin = postgres(baseUrl, { max: 1, onnotice: () => {} });
// BENCH_ARCHIVE_HEAP_MIB caps each step's V8 heap: a lab that fits at 100k under the cap that 10k
// needs shows that memory does not grow with the lab (peak RSS alone also counts lazy collection).
const heapCap = process.env.BENCH_ARCHIVE_HEAP_MIB ? [`--max-old-space-size=${process.env.BENCH_ARCHIVE_HEAP_MIB}`] : [];

function step(args: string[]): Record<string, number> {
  const out = execFileSync(process.execPath, ['--expose-gc', ...heapCap, '--import', 'tsx', 'bench/archiveRun.ts', ...args], { encoding: 'utf8', maxBuffer: 1 << 20 });
  return JSON.parse(out.trim().split('\n').at(-1)!) as Record<string, number>;
}

async function serverTarget(tag: string): Promise<string> {
  const name = `fl_archive_bench_${tag}_${Date.now()}`;
  await admin.unsafe(`create database ${name}`);
  const url = new URL(baseUrl);
  url.pathname = `/${name}`;
  return url.toString();
}

const f = (n: number | undefined, digits = 1) => (n === undefined ? '-' : n.toFixed(digits));
const created: string[] = [];
try {
  console.log('database  readings  file MiB  export s  export peak RSS MiB (before)  import s  rows/s  import peak RSS MiB (before)');
  for (const kind of ['server', 'embedded'] as const) {
    for (const size of SIZES) {
      const file = join(work, `${kind}-${size}.flarchive`);
      const source = kind === 'server' ? await serverTarget(`src${size}`) : join(work, `${kind}-${size}-src`);
      const target = kind === 'server' ? await serverTarget(`dst${size}`) : join(work, `${kind}-${size}-dst`);
      if (kind === 'server') created.push(new URL(source).pathname.slice(1), new URL(target).pathname.slice(1));
      const exported = step(['export', source, String(size), file]);
      const imported = step(['import', target, file]);
      console.log(
        `${kind.padEnd(9)} ${String(size).padStart(8)}  ${f(exported.fileMiB).padStart(8)}  ${f(exported.seconds).padStart(8)}  ${f(exported.peakRssMiB, 0).padStart(20)} (${f(exported.rssBeforeMiB, 0)})` +
          `  ${f(imported.seconds).padStart(8)}  ${f(imported.rows! / imported.seconds!, 0).padStart(6)}  ${f(imported.peakRssMiB, 0).padStart(20)} (${f(imported.rssBeforeMiB, 0)})`,
      );
    }
  }
} finally {
  for (const name of created) await admin.unsafe(`drop database if exists ${name} with (force)`);
  await admin.end();
  rmSync(work, { recursive: true, force: true });
}
