import type { ImportAgainstCopy } from './importRate.ts';
import type { LatencyFigure } from './latency.ts';
import type { ThroughputFigure } from './throughput.ts';

export interface BenchReport {
  rows: number;
  models: number;
  sites: number;
  imports: ImportAgainstCopy;
  latency: LatencyFigure[];
  throughput: ThroughputFigure[];
  nodeVersion: string;
  postgresVersion: string;
}

const f = (v: number, digits = 1) => v.toFixed(digits);
const verdict = (ok: boolean) => (ok ? 'meets target' : 'BELOW target');

/** The figures as a markdown table, ready for the README's Performance section. */
export function printReport(r: BenchReport): void {
  const { imports } = r;
  const importRatio = imports.importRowsPerSecond / imports.copyRowsPerSecond;
  const { median, min, max } = imports.fileRatio;
  const [service, bare, bareQuery] = r.throughput as [ThroughputFigure, ThroughputFigure, ThroughputFigure];
  const rpsRatio = service.requestsPerSecond / bare.requestsPerSecond;
  const queryRatio = service.requestsPerSecond / bareQuery.requestsPerSecond;
  const lines = [
    `Lab history: ${r.rows.toLocaleString('en')} readings, ${r.models.toLocaleString('en')} models, ${r.sites.toLocaleString('en')} sites; Node ${r.nodeVersion}, PostgreSQL ${r.postgresVersion}, 2 cores.`,
    '',
    '| measure | service | baseline | ratio | target |',
    '|---|---|---|---|---|',
    `| bulk import, rows/s (import route vs raw COPY, ${imports.files} files each COPYed and imported back to back) | ${f(imports.importRowsPerSecond, 0)} | ${f(imports.copyRowsPerSecond, 0)} | ${f(importRatio, 2)} (per file: median ${f(median, 2)}, ${f(min, 2)}–${f(max, 2)}) | ≥ 0.5: ${verdict(importRatio >= 0.5)} |`,
    ...r.latency.map((l) => {
      const ratio = l.service.medianMs / l.direct.medianMs;
      return `| ${l.name}: median / p95 ms (service vs same SQL direct) | ${f(l.service.medianMs)} / ${f(l.service.p95Ms)} | ${f(l.direct.medianMs)} / ${f(l.direct.p95Ms)} | ${f(ratio, 2)} (p95 ${f(l.service.p95Ms / l.direct.p95Ms, 2)}) | ≤ 1.5: ${verdict(ratio <= 1.5)} |`;
    }),
    `| ${service.name} vs bare hono JSON, requests/s (loopback, 16 concurrent, median of 3 rounds) | ${f(service.requestsPerSecond, 0)} | ${f(bare.requestsPerSecond, 0)} | ${f(rpsRatio, 2)} | ≥ 0.5: ${verdict(rpsRatio >= 0.5)} |`,
    `| for context: the same service route vs a bare hono route making the same one-row query through postgres.js | ${f(service.requestsPerSecond, 0)} | ${f(bareQuery.requestsPerSecond, 0)} | ${f(queryRatio, 2)} | none |`,
  ];
  console.log(`\n${lines.join('\n')}\n`);
  const failures = r.throughput.filter((t) => t.failed > 0);
  if (failures.length > 0) console.log(`non-200 answers: ${failures.map((t) => `${t.name}: ${t.failed}`).join(', ')}`);
}
