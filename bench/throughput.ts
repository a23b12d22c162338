import type { AddressInfo } from 'node:net';
import { Worker } from 'node:worker_threads';
import { serve } from '@hono/node-server';
import { Hono } from 'hono';
import type { createApp } from '../api/createApp.ts';

export interface ThroughputFigure {
  name: string;
  requests: number;
  failed: number;
  seconds: number;
  requestsPerSecond: number;
}

/** What bench/loadWorker.mjs is given. */
interface LoadJob {
  url: string;
  headers: Record<string, string>;
  requests: number;
  concurrency: number;
  maxMs: number;
}

type Fetch = (request: Request) => Response | Promise<Response>;

/** Serves `fetch` on a loopback port and loads it from a worker thread, bounded in count and time. */
async function load(name: string, fetch: Fetch, path: string, headers: Record<string, string>, requests: number, maxMs: number): Promise<ThroughputFigure> {
  const server = serve({ fetch, port: 0, hostname: '127.0.0.1' });
  await new Promise<void>((resolve) => server.once('listening', () => resolve()));
  const { port } = server.address() as AddressInfo;
  const job: LoadJob = { url: `http://127.0.0.1:${port}${path}`, headers, requests, concurrency: 16, maxMs };
  try {
    const result = await new Promise<{ done: number; failed: number; seconds: number }>((resolve, reject) => {
      const worker = new Worker(new URL('./loadWorker.mjs', import.meta.url), { workerData: job });
      worker.once('message', resolve);
      worker.once('error', reject);
    });
    return { name, requests: result.done, failed: result.failed, seconds: result.seconds, requestsPerSecond: result.done / result.seconds };
  } finally {
    await new Promise<void>((resolve) => server.close(() => resolve()));
  }
}

const ROUNDS = 3;

const medianOf = (figures: ThroughputFigure[]): ThroughputFigure => [...figures].sort((a, b) => a.requestsPerSecond - b.requestsPerSecond)[Math.floor(figures.length / 2)]!;

/**
 * The service's read route against a bare hono JSON route, same server adapter and client, and
 * against a bare route that makes the same one-row query (`sameQuery`) straight through
 * postgres.js: the round trip to the database the service cannot avoid. Rounds alternate and the
 * median round of each counts, since two cores shared with the database make single runs noisy.
 */
export async function measureThroughput(app: ReturnType<typeof createApp>, key: string, readPath: string, sameQuery: () => Promise<unknown>, requests: number, maxMs: number): Promise<ThroughputFigure[]> {
  const bare = new Hono();
  bare.get('/bare', (c) => c.json({ status: 'ok' }));
  bare.get('/bare-query', async (c) => c.json(await sameQuery()));
  const headers = { authorization: `Bearer ${key}` };
  const cases = [
    { name: `service GET ${readPath.replace(/[0-9a-f-]{36}/, '{id}')}`, fetch: app.fetch, path: readPath },
    { name: 'bare hono GET /bare', fetch: bare.fetch, path: '/bare' },
    { name: 'bare hono GET with the same query', fetch: bare.fetch, path: '/bare-query' },
  ];
  for (const c of cases) await load('warm-up', c.fetch, c.path, headers, 500, maxMs);
  const rounds: ThroughputFigure[][] = cases.map(() => []);
  for (let round = 0; round < ROUNDS; round++) {
    for (const [i, c] of cases.entries()) rounds[i]!.push(await load(c.name, c.fetch, c.path, headers, requests, maxMs));
  }
  return rounds.map(medianOf);
}
