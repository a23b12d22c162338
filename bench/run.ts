import { randomUUID } from 'node:crypto';
import postgres from 'postgres';
import { createApp } from '../api/createApp.ts';
import { defaultConfig } from '../api/env.ts';
import { CompareQuery, ControlChartQuery, EdgeAgingQuery, ResidualTrendQuery } from '../db/inputs/trends.ts';
import { migrateDatabase } from '../db/migrateDatabase.ts';
import { openDatabase } from '../db/openDatabase.ts';
import { createLab } from '../db/operations/createLab.ts';
import { createApiKey } from '../db/operations/keys/createApiKey.ts';
import { compareUnitsSql } from '../db/operations/trends/compareTrendGroups.ts';
import { edgeAgingPointsSql, storedModelsSql } from '../db/operations/trends/edgeAgingSql.ts';
import { batchSeriesSql } from '../db/operations/trends/readControlChart.ts';
import { residualSummarySql } from '../db/operations/trends/residualSummarySql.ts';
import { type BenchFile, copyBody, csvBody, measureImportAgainstCopy } from './importRate.ts';
import { BAD_BATCH, batchCode, type HistoryPlan, planModels, readingChunks } from './labHistory.ts';
import { type LatencyCase, measureLatency } from './latency.ts';
import { loadStructure } from './loadStructure.ts';
import { printReport } from './report.ts';
import { measureThroughput } from './throughput.ts';

// Sizes can be lowered for a quick trial (BENCH_MODELS=500); the defaults are the figures reported.
const models = Number(process.env.BENCH_MODELS ?? 10_000);
const plan: HistoryPlan = { batches: 20, modelsPerBatch: Math.ceil(models / 20), readingsPerSite: 25, randomStart: 20_261_201 };
const baseUrl = process.env.BENCH_DATABASE_URL ?? 'postgres://postgres@127.0.0.1:5432/postgres';
const CHUNK_ROWS = 50_000;
const RUNS = Number(process.env.BENCH_RUNS ?? 15);

const log = (message: string) => console.log(`[bench ${new Date().toISOString().slice(11, 19)}] ${message}`);

const admin = postgres(baseUrl, { max: 1, onnotice: () => {} });
const name = `fl_bench_${Date.now()}`;
await admin.unsafe(`create database ${name}`);
const url = new URL(baseUrl);
url.pathname = `/${name}`;
const handle = await openDatabase({ databaseUrl: url.toString(), dataDir: '', poolSize: 10 });
const raw = postgres(url.toString(), { max: 4, onnotice: () => {} });
try {
  await migrateDatabase(handle);
  const lab = await createLab(handle.db, 'bench lab');
  const technician = await createApiKey(handle.db, lab.labId, { label: 'bench technician', role: 'technician' });
  const { models: modelList, sites } = planModels(plan);
  await loadStructure(raw, lab.labId, plan, modelList, sites);
  log(`structure: ${modelList.length} models, ${sites.length} sites`);

  const files: BenchFile[] = [];
  for (const chunk of readingChunks(sites, plan, CHUNK_ROWS)) {
    const origin = { labId: lab.labId, importId: randomUUID(), keyId: technician.id };
    files.push({ rows: chunk.length, csv: csvBody(chunk), copy: copyBody(chunk, origin), origin });
  }
  const rows = files.reduce((sum, file) => sum + file.rows, 0);
  log(`generated ${rows} readings in ${files.length} files`);
  const app = createApp({ db: handle.db, config: defaultConfig() });
  const imports = await measureImportAgainstCopy(raw, app, technician.secret, files, (done) => log(`file ${done} of ${files.length}: COPYed (rolled back) and imported`));
  log(`import route: ${imports.importRowsPerSecond.toFixed(0)} rows/s, COPY ${imports.copyRowsPerSecond.toFixed(0)} rows/s`);
  await raw.unsafe('vacuum analyze');

  const bad = batchCode(BAD_BATCH);
  const at = '2026-06-01T00:00:00Z';
  const residual = ResidualTrendQuery.parse({ stage: 'inspection', groupBy: 'batch' });
  const chart = ControlChartQuery.parse({ batch: bad, stage: 'before_load' });
  const aging = EdgeAgingQuery.parse({ batch: bad, at });
  const compare = CompareQuery.parse({ by: 'batch', a: batchCode(0), b: bad });
  const cases: LatencyCase[] = [
    { name: 'residuals by batch, inspection stage (whole lab)', path: '/v1/trends/residuals?stage=inspection&groupBy=batch', statements: [residualSummarySql({ labId: lab.labId, query: residual, limitOrder: 0.2 })], runs: 5 },
    { name: 'residuals by month, before_load (whole lab)', path: '/v1/trends/residuals?stage=before_load&groupBy=month', statements: [residualSummarySql({ labId: lab.labId, query: ResidualTrendQuery.parse({ groupBy: 'month' }), limitOrder: 0.2 })] },
    { name: `control chart, batch ${bad} (one point per model)`, path: `/v1/trends/control-chart?batch=${bad}&stage=before_load`, statements: [batchSeriesSql(lab.labId, chart)] },
    { name: `edge-aging fit and forecasts, batch ${bad}`, path: `/v1/trends/edge-aging?batch=${bad}&at=${at}`, statements: [edgeAgingPointsSql(lab.labId, aging), storedModelsSql(lab.labId, aging)] },
    { name: `compare ${batchCode(0)} vs ${bad}, per model`, path: `/v1/trends/compare?by=batch&a=${batchCode(0)}&b=${bad}`, statements: [compareUnitsSql(lab.labId, compare)] },
  ];
  const latency = await measureLatency(app, technician.secret, raw, cases, RUNS);
  log('latency measured');
  const [site] = await raw<{ id: string }[]>`select id from sites where lab_id = ${lab.labId} limit 1`;
  // As many connections as the service's pool, so only the service's own work differs.
  const reader = postgres(url.toString(), { max: 10, onnotice: () => {} });
  const sameQuery = async () => (await reader`select * from sites where id = ${site!.id} and lab_id = ${lab.labId}`)[0];
  const throughput = await measureThroughput(app, technician.secret, `/v1/sites/${site!.id}`, sameQuery, 20_000, 20_000).finally(() => reader.end({ timeout: 5 }));
  const [versions] = await raw<{ version: string }[]>`select current_setting('server_version') as version`;
  printReport({ rows, models: modelList.length, sites: sites.length, imports, latency, throughput, nodeVersion: process.version, postgresVersion: versions!.version });
} finally {
  await raw.end({ timeout: 5 });
  await handle.close();
  await admin.unsafe(`drop database if exists ${name} with (force)`);
  await admin.end({ timeout: 5 });
}
