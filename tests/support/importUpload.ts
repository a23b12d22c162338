import { request } from 'node:http';
import type postgres from 'postgres';

export interface UploadReply {
  status: number;
  text: string;
  headers: Record<string, string | string[] | undefined>;
}

export interface UploadOptions {
  idempotencyKey?: string;
  /** Send only this many bytes of the body, then cut the connection. */
  cutAfterBytes?: number;
  signal?: AbortSignal;
}

/** A CSV of `rows` direct readings at one site, each row its own minute. */
export function readingFile(siteId: string, rows: number, operator = 'R. Okafor'): string {
  const lines = ['site_id,stage,observed_at,operator,wavelength_nm,method,fringe_order'];
  const t0 = Date.parse('2026-01-01T00:00:00Z');
  for (let i = 0; i < rows; i++) lines.push(`${siteId},inspection,${new Date(t0 + i * 60_000).toISOString()},${operator},577,direct,${((i % 50) / 100).toFixed(2)}`);
  return `${lines.join('\n')}\n`;
}

/**
 * POSTs a file to the import route over a raw connection, so a test can cut the upload part-way
 * or abort while the service works. Rejects when the connection is cut before an answer.
 */
export function uploadImport(baseUrl: string, key: string, body: string, options: UploadOptions = {}): Promise<UploadReply> {
  return new Promise((resolve, reject) => {
    const bytes = Buffer.from(body);
    const req = request(`${baseUrl}/v1/readings/import`, {
      method: 'POST',
      headers: {
        authorization: `Bearer ${key}`,
        'content-type': 'text/csv',
        'content-length': bytes.length,
        ...(options.idempotencyKey ? { 'idempotency-key': options.idempotencyKey } : {}),
      },
      ...(options.signal ? { signal: options.signal } : {}),
    });
    req.on('response', (res) => {
      let text = '';
      res.setEncoding('utf8');
      res.on('data', (chunk) => (text += chunk));
      res.on('end', () => resolve({ status: res.statusCode ?? 0, text, headers: res.headers }));
      res.on('error', reject);
    });
    req.on('error', reject);
    if (options.cutAfterBytes === undefined) {
      req.end(bytes);
    } else {
      req.write(bytes.subarray(0, options.cutAfterBytes), () => setTimeout(() => req.destroy(new Error('cut by the test')), 200));
    }
  });
}

/** Waits until some session of the service holds a transaction that has written (an import under way). */
export async function whenWriting(sql: postgres.Sql, timeoutMs = 30_000): Promise<number[]> {
  const started = Date.now();
  while (Date.now() - started < timeoutMs) {
    const rows = await sql<{ pid: number }[]>`select pid from pg_stat_activity where datname = current_database() and backend_xid is not null and pid <> pg_backend_pid()`;
    if (rows.length > 0) return rows.map((r) => r.pid);
    await new Promise((resolve) => setTimeout(resolve, 5));
  }
  throw new Error('no write transaction began in time');
}

export async function countOf(sql: postgres.Sql, table: 'readings' | 'reading_imports'): Promise<number> {
  const [row] = await sql.unsafe<{ n: number }[]>(`select count(*)::int as n from ${table}`);
  return row!.n;
}
