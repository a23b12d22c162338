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

/** The service's read route against a bare hono JSON route, same server adapter and client. */
export async function measureThroughput(app: ReturnType<typeof createApp>, key: string, readPath: string, requests: number, maxMs: number): Promise<ThroughputFigure[]> {
  const bare = new Hono();
  bare.get('/bare', (c) => c.json({ status: 'ok' }));
  const headers = { authorization: `Bearer ${key}` };
  await load('warm-up', app.fetch, readPath, headers, 500, maxMs);
  await load('warm-up', bare.fetch, '/bare', headers, 500, maxMs);
  const service = await load(`service GET ${readPath.replace(/[0-9a-f-]{36}/, '{id}')}`, app.fetch, readPath, headers, requests, maxMs);
  const baseline = await load('bare hono GET /bare', bare.fetch, '/bare', headers, requests, maxMs);
  return [service, baseline];
}
