// Load on loopback at twice a large lab's peak, bounded in time: npm run bench:load.
//
// A large lab, as estimated here: 20 people at polariscopes recording a reading every 30 s at
// peak (0.7 writes/s), 50 people and dashboards reading (lists, analyses, trends) every 2 s
// (25 reads/s), and a spreadsheet import every few minutes: about 26 requests/s. Twice that is
// 52/s; the bench runs 60/s, one write in ten (6 writes/s, eight times the estimate), plus an
// import of 200 rows every 10 s, for LOAD_SECONDS (default 60) after a 10 s warm-up.
import autocannon, { type Result } from 'autocannon';
import { httpClient } from '../tests/support/httpClient.ts';
import { createServerDatabase } from '../tests/support/serverDatabase.ts';
import { startServer } from '../tests/support/serverProcess.ts';
import { importFile, mixCycle, mixTargets } from './loadMix.ts';
import { sampleRss } from './rssSampler.ts';

const RATE_PER_S = 60;
const SECONDS = Number(process.env.LOAD_SECONDS ?? 60);
const WARM_UP_S = 10;
const IMPORT_EVERY_MS = 10_000;
const baseUrl = process.env.TEST_DATABASE_URL ?? 'postgres://postgres@127.0.0.1:5432/test';

const percentile = (values: number[], p: number) => {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)] ?? NaN;
};
const median = (values: number[]) => percentile(values, 50);

function run(url: string, requests: ReturnType<typeof mixCycle>, seconds: number, latencies: number[]) {
  return new Promise<Result>((resolve) => {
    const instance = autocannon({ url, connections: 10, overallRate: RATE_PER_S, duration: seconds, timeout: 10, requests });
    instance.on('response', (_client, _status, _bytes, ms) => latencies.push(ms));
    instance.on('done', resolve);
  });
}

const database = await createServerDatabase(baseUrl, 'fl_load');
const server = await startServer({ DATABASE_URL: database.url, LOAD_DEMO: 'auto', DB_POOL_SIZE: '10' });
try {
  const { viewer, technician } = server.keys as Record<string, string>;
  const targets = await mixTargets(httpClient(server.url, viewer));
  const cycle = mixCycle(targets, viewer!, technician!);
  await run(server.url, cycle, WARM_UP_S, []);

  const rss = sampleRss(server.child.pid!);
  const importer = httpClient(server.url, technician);
  const importTimes: number[] = [];
  let importFailures = 0;
  let imports = 0;
  const importTimer = setInterval(async () => {
    const started = performance.now();
    const reply = await importer.send('POST', '/v1/readings/import', { body: importFile(targets.siteIds, imports++), headers: { 'content-type': 'text/csv', 'idempotency-key': `load-${Date.now()}` } });
    importTimes.push(performance.now() - started);
    if (reply.status !== 201) importFailures++;
  }, IMPORT_EVERY_MS);
  const latencies: number[] = [];
  const result = await run(server.url, cycle, SECONDS, latencies);
  clearInterval(importTimer);
  await new Promise((resolve) => setTimeout(resolve, 2000));
  const samples = rss.stop();

  const third = Math.max(1, Math.floor(samples.length / 3));
  const rssStart = median(samples.slice(0, third));
  const rssEnd = median(samples.slice(-third));
  const growthPct = ((rssEnd - rssStart) / rssStart) * 100;
  const errors = result.errors + result.timeouts + result.non2xx + importFailures;
  const summary = {
    seconds: SECONDS,
    targetRatePerS: RATE_PER_S,
    requests: result.requests.total,
    achievedRatePerS: Math.round((result.requests.total / SECONDS) * 10) / 10,
    errors,
    p50Ms: Math.round(percentile(latencies, 50)),
    p95Ms: Math.round(percentile(latencies, 95)),
    p99Ms: Math.round(percentile(latencies, 99)),
    imports: importTimes.length,
    importP95Ms: Math.round(percentile(importTimes, 95)),
    rssStartMiB: Math.round(rssStart),
    rssEndMiB: Math.round(rssEnd),
    rssMaxMiB: Math.round(Math.max(...samples)),
    rssGrowthPct: Math.round(growthPct * 10) / 10,
  };
  console.log(JSON.stringify(summary));
  console.log(
    `load: ${summary.requests} requests in ${SECONDS} s at ${summary.achievedRatePerS}/s (target ${RATE_PER_S}/s) + ${summary.imports} imports of 200 rows; ` +
      `${errors} errors; p50 ${summary.p50Ms} ms, p95 ${summary.p95Ms} ms, p99 ${summary.p99Ms} ms; import p95 ${summary.importP95Ms} ms; ` +
      `RSS ${summary.rssStartMiB} → ${summary.rssEndMiB} MiB (max ${summary.rssMaxMiB}, ${summary.rssGrowthPct} %)`,
  );
  // Memory may settle a little after warm-up; a steady climb over a minute is what a leak looks like.
  if (errors > 0 || growthPct > 15) process.exitCode = 1;
} finally {
  await server.stop('SIGTERM');
  await database.drop();
}
