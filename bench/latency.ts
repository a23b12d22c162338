import type { SQL } from 'drizzle-orm';
import { PgDialect } from 'drizzle-orm/pg-core';
import type { Sql } from 'postgres';
import type { createApp } from '../api/createApp.ts';
import { type Timing, timed, timingOf } from './timing.ts';

export interface LatencyCase {
  name: string;
  /** The route and query string the service answers. */
  path: string;
  /** The statements the operation sends, run side by side as the operation does. */
  statements: SQL[];
  /** Fewer runs for the statements that read the whole history, to bound the bench's time. */
  runs?: number;
}

export interface LatencyFigure {
  name: string;
  service: Timing;
  direct: Timing;
}

const dialect = new PgDialect();

/**
 * Median and p95 of a trend route through the whole service (auth, validation, operation, JSON)
 * against the same SQL text and parameters sent straight to postgres.js. Runs alternate so
 * caches warm both alike.
 */
export async function measureLatency(app: ReturnType<typeof createApp>, key: string, sql: Sql, cases: readonly LatencyCase[], runs: number): Promise<LatencyFigure[]> {
  const figures: LatencyFigure[] = [];
  for (const c of cases) {
    const queries = c.statements.map((s) => dialect.sqlToQuery(s));
    const service = async () => {
      const res = await app.request(c.path, { headers: { authorization: `Bearer ${key}` } });
      if (res.status !== 200) throw new Error(`${c.path} answered ${res.status}: ${await res.text()}`);
      await res.arrayBuffer();
    };
    const direct = () => Promise.all(queries.map((q) => sql.unsafe(q.sql, q.params as never[])));
    for (let i = 0; i < 2; i++) {
      await service();
      await direct();
    }
    const serviceMs: number[] = [];
    const directMs: number[] = [];
    for (let i = 0; i < (c.runs ?? runs); i++) {
      serviceMs.push(await timed(service));
      directMs.push(await timed(direct));
    }
    figures.push({ name: c.name, service: timingOf(serviceMs), direct: timingOf(directMs) });
  }
  return figures;
}
