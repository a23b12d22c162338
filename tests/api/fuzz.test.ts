import fc from 'fast-check';
import { parse } from 'csv-parse/sync';
import { stringify } from 'csv-stringify/sync';
import { describe, expect, inject, it } from 'vitest';
import { clientFor } from '../support/client.ts';
import { countRows } from '../support/countRows.ts';
import { factoriesFor } from '../support/factories.ts';
import { type FuzzRequest, fuzzRequestsFor } from '../support/fuzzRequests.ts';
import { readWriteRoutes } from '../support/fuzzRouteTable.ts';
import type { Json } from '../support/fuzzValidValue.ts';
import { inLab } from '../support/inLab.ts';

// Small limits keep the oversized cases cheap; the limits themselves are settings.
const BODY_LIMIT_BYTES = 8192;
const IMPORT_LIMIT_BYTES = 65_536;
// The embedded database answers each request several times slower; fewer runs keep it under a minute.
const RUNS_PER_ROUTE = Number(process.env.FUZZ_RUNS_PER_ROUTE ?? (inject('serverDatabaseUrl') ? 120 : 100));
// Export columns an import ignores: left out of the base file so every changed cell is one it reads.
// CI replays one fixed sequence so a landing never hangs on a new draw; locally each run explores
// new inputs (FUZZ_REPLAY replays a reported failure).
const REPLAY = process.env.FUZZ_REPLAY ? Number(process.env.FUZZ_REPLAY) : process.env.CI ? 20_261_202 : undefined;
const OUTPUT_ONLY = ['id', 'fringe_order_uncertainty', 'supersedes_id', 'amendment_reason', 'recorded_at'];
const OUTPUT_ONLY_JSON = ['id', 'fringeOrderUncertainty', 'supersedesId', 'amendmentReason', 'recordedAt'];

function withoutColumns(csv: string, drop: string[]): string {
  const [header, ...rows] = parse(csv) as string[][];
  const keep = header!.map((name, i) => (drop.includes(name) ? -1 : i)).filter((i) => i >= 0);
  return stringify([header!, ...rows].map((row) => keep.map((i) => row[i]!)));
}

describe('malformed requests to every write route', () => {
  it('are refused with problem+json, never a 5xx, and leave every table as it was', () =>
    inLab(
      async (lab) => {
        const site = await lab.make.site();
        const reading = await lab.make.reading(site.id);
        const batchId = (await lab.admin.get(`/v1/models/${site.modelId}`)).body.batchId as string;
        const materialId = (await lab.admin.get(`/v1/batches/${batchId}`)).body.materialId as string;
        const key = (await lab.admin.post('/v1/keys', { label: 'fuzz target', role: 'viewer' })).body;
        const other = await lab.otherLab();
        const otherSite = await factoriesFor(other.admin).site();
        const exported = await lab.admin.get(`/v1/readings/export?siteId=${site.id}`);
        const exportedJson = await lab.admin.get(`/v1/readings/export?siteId=${site.id}&format=json`);
        expect(exported.status).toBe(200);
        const jsonReadings = (exportedJson.body.readings as Record<string, unknown>[]).map((r) => Object.fromEntries(Object.entries(r).filter(([k, v]) => !OUTPUT_ONLY_JSON.includes(k) && v !== null))) as Json[];

        const table = await readWriteRoutes(lab.anonymous);
        const context = {
          ids: { modelId: site.modelId, siteId: site.id, readingId: reading.id, batchId, materialId, keyId: key.id },
          foreignIds: [otherSite.id, otherSite.modelId, crypto.randomUUID()],
          bodyLimitBytes: BODY_LIMIT_BYTES,
          importLimitBytes: IMPORT_LIMIT_BYTES,
          resolve: table.resolve,
          baseBodies: { '/v1/readings/import': { csv: withoutColumns(exported.text, OUTPUT_ONLY), json: { readings: jsonReadings } } },
        };
        const before = await countRows(lab.db);
        const kinds = new Map<string, number>();
        let tried = 0;
        for (const route of table.routes) {
          const client = clientFor(lab.app, lab.keys[route.minRole]);
          const started = performance.now();
          await fc.assert(
            fc.asyncProperty(fuzzRequestsFor(route, context), async (request: FuzzRequest) => {
              tried++;
              const family = request.kind.replace(/ at .*| \(.*\)|".*"/g, '').trim();
              kinds.set(family, (kinds.get(family) ?? 0) + 1);
              const reply = await client.send(request.method, request.path, { body: request.body as BodyInit, headers: request.headers });
              const label = `${request.method} ${request.path} [${request.kind}] → ${reply.status} ${reply.text.slice(0, 300)}`;
              expect(reply.status, label).toBeGreaterThanOrEqual(400);
              expect(reply.status, label).toBeLessThan(500);
              expect(reply.headers.get('content-type'), label).toMatch(/^application\/problem\+json/);
              expect(reply.body?.status, label).toBe(reply.status);
              expect(typeof reply.body?.code, label).toBe('string');
            }),
            { numRuns: RUNS_PER_ROUTE, ...(REPLAY === undefined ? {} : { seed: REPLAY }) },
          );
          if (process.env.FUZZ_VERBOSE) console.log(`${route.method} ${route.template}: ${Math.round(performance.now() - started)} ms`);
        }
        expect(await countRows(lab.db)).toEqual(before);
        console.log(`fuzz: ${tried} malformed requests to ${table.routes.length} write routes, all 4xx problem+json, ${Object.keys(before).length} tables unchanged; kinds: ${[...kinds].map(([k, n]) => `${k} ${n}`).join(', ')}`);
      },
      { BODY_LIMIT_BYTES, IMPORT_LIMIT_BYTES },
    ), 120_000);
});
