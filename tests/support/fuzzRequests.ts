import { gzipSync } from 'node:zlib';
import fc from 'fast-check';
import type { JsonSchema, RouteParameter, WriteRoute } from './fuzzRouteTable.ts';
import { type Json, type KnownIds, validValue } from './fuzzValidValue.ts';
import { csvCases } from './fuzzCsvBodies.ts';
import { applyAt, violationsOf } from './fuzzViolations.ts';

export interface FuzzRequest {
  kind: string;
  method: string;
  path: string;
  headers: Record<string, string>;
  body?: string | Uint8Array;
}

export interface FuzzContext {
  ids: KnownIds;
  /** Ids that do not exist in the caller's lab (another lab's record, a random one). */
  foreignIds: string[];
  bodyLimitBytes: number;
  importLimitBytes: number;
  resolve(schema: JsonSchema): JsonSchema;
  /** A valid body per route and media type when the suite has one (imports: an export of the lab). */
  baseBodies: Record<string, { json?: Json; csv?: string }>;
}

const ID_BY_COLLECTION: Record<string, string> = { models: 'modelId', sites: 'siteId', readings: 'readingId', batches: 'batchId', materials: 'materialId', keys: 'keyId' };
const JSON_TYPE = { 'content-type': 'application/json' };
const BAD_BYTES: number[][] = [[0xff], [0xfe, 0xff], [0xc0, 0x80], [0x80], [0xe2, 0x82], [0xed, 0xa0, 0x80], [0xf4, 0x90, 0x80, 0x80]];
const NUMBER_TOKENS = ['NaN', 'Infinity', '-Infinity', '1e999', '-1e999', '0x10', '.5', '+1', '01', '1.', '1e'];
const WRONG_TYPES = ['text/plain', 'application/xml', 'multipart/form-data; boundary=x', 'application/x-www-form-urlencoded', 'application/json; charset=iso-8859-1', 'application/jsonx', 'json', 'text/json5', 'application/octet-stream'];
const SENTINEL = '\u0001fuzz-number\u0001';

/** The documented path with each {param} filled by a record of that collection that exists. */
export function pathWithIds(template: string, ids: KnownIds, override?: string): string {
  return template.replace(/\/([^/]+)\/\{[^}]+\}/g, (_m, collection: string) => `/${collection}/${encodeURIComponent(override ?? ids[ID_BY_COLLECTION[collection] ?? ''] ?? crypto.randomUUID())}`);
}

const junkQuery = fc.option(
  fc.array(fc.tuple(fc.constantFrom('limit', 'cursor', 'x', '__proto__', 'format', 'labId'), fc.string({ maxLength: 8 })), { minLength: 1, maxLength: 3 }).map((pairs) => `?${new URLSearchParams(pairs).toString()}`),
  { nil: '' },
);

const limitOf = (route: WriteRoute, context: FuzzContext) => (/\/import$/.test(route.template) ? context.importLimitBytes : context.bodyLimitBytes);

/** Ids the caller cannot reach: another lab's, a random one, and strings that are no id at all. */
function pathIds(route: WriteRoute, context: FuzzContext): fc.Arbitrary<[string, string]> {
  return fc.constantFrom(...context.foreignIds, 'not-an-id', '..', '%00', '7d1c0e52', "1' or '1'='1").map((id) => [id, pathWithIds(route.template, context.ids, id)]);
}

function withBadBytes(text: string): fc.Arbitrary<Uint8Array> {
  const bytes = new TextEncoder().encode(text);
  return fc.tuple(fc.nat({ max: bytes.length }), fc.constantFrom(...BAD_BYTES)).map(([at, bad]) => new Uint8Array([...bytes.subarray(0, at), ...bad, ...bytes.subarray(at)]));
}

function numberPaths(value: Json, path: (string | number)[] = []): (string | number)[][] {
  if (typeof value === 'number') return [path];
  if (value === null || typeof value !== 'object') return [];
  return Object.entries(value).flatMap(([k, v]) => numberPaths(v, [...path, Array.isArray(value) ? Number(k) : k]));
}

/** Malformed JSON bodies for one route: each is certain to be refused. */
function jsonBodies(route: WriteRoute, context: FuzzContext, path: string): fc.Arbitrary<FuzzRequest>[] {
  const schema = route.jsonSchema!;
  const base = context.baseBodies[route.template]?.json ?? validValue(schema, context.resolve, context.ids);
  const text = JSON.stringify(base);
  const request = (kind: string, body: string | Uint8Array, headers: Record<string, string> = JSON_TYPE) => ({ kind, method: route.method, path, headers, body });
  const violations = violationsOf(schema, base, context.resolve, context.ids);
  const arbitraries: fc.Arbitrary<FuzzRequest>[] = [
    fc.constantFrom(...violations).chain((v) => v.value.map((replacement) => request(`schema: ${v.kind} at ${v.path.join('.') || 'body'}`, JSON.stringify(applyAt(base, v.path, replacement)) ?? 'null'))),
    fc.nat({ max: Math.max(0, text.length - 1) }).map((n) => request('truncated JSON', text.slice(0, n))),
    withBadBytes(text).map((bytes) => request('invalid UTF-8', bytes)),
    fc.string({ maxLength: 40 }).filter((s) => !/^\s*\{/.test(s)).map((s) => request('not a JSON object', s)),
    fc.constantFrom(...WRONG_TYPES, '').map((type) => request(`content type "${type}"`, text, type ? { 'content-type': type } : {})),
    fc.tuple(fc.integer({ min: 1, max: 4096 }), fc.boolean()).map(([extra, declare]) => {
      const padded = `${text.slice(0, -1)}${' '.repeat(Math.max(0, limitOf(route, context) - text.length + extra))}}`;
      return request(`oversized${declare ? ' (declared)' : ''}`, padded, declare ? { ...JSON_TYPE, 'content-length': String(Buffer.byteLength(padded)) } : JSON_TYPE);
    }),
  ];
  if (route.template.includes('{')) arbitraries.push(pathIds(route, context).map(([id, wrongPath]) => ({ ...request(`path id "${id}"`, text), path: wrongPath })));
  const numbers = numberPaths(base);
  if (numbers.length > 0) {
    arbitraries.push(
      fc.tuple(fc.constantFrom(...numbers), fc.constantFrom(...NUMBER_TOKENS)).map(([at, token]) => request(`number token ${token}`, JSON.stringify(applyAt(base, at, SENTINEL)).replace(JSON.stringify(SENTINEL), token))),
    );
  }
  arbitraries.push(...headerViolations(route.parameters, context).map((arb) => arb.map(([name, value]) => request(`header ${name}`, text, { ...JSON_TYPE, [name]: value }))));
  return arbitraries;
}

function headerViolations(parameters: RouteParameter[], context: FuzzContext): fc.Arbitrary<[string, string]>[] {
  return parameters
    .filter((p) => p.in === 'header')
    .flatMap((p) =>
      violationsOf(p.schema, 'ok', context.resolve, context.ids)
        .filter((v) => v.kind === 'too long' || v.kind === 'empty')
        .map((v) => v.value.map((value) => [p.name, String(value)] as [string, string])),
    );
}

/** Every kind of malformed request for one route, each kind equally likely, plus a junk query. */
export function fuzzRequestsFor(route: WriteRoute, context: FuzzContext): fc.Arbitrary<FuzzRequest> {
  const path = pathWithIds(route.template, context.ids);
  const kinds: fc.WeightedArbitrary<FuzzRequest>[] = [];
  if (route.jsonSchema) {
    const [schemaViolations, ...others] = jsonBodies(route, context, path);
    // Most runs go to the schema, where the variety is; the other kinds are few and fixed.
    kinds.push({ arbitrary: schemaViolations!, weight: 6 }, ...others.map((arbitrary) => ({ arbitrary, weight: 1 })));
  }
  const csv = context.baseBodies[route.template]?.csv;
  const fileRoute = route.contentTypes.some((t) => t !== 'application/json');
  if (fileRoute) kinds.push(...(csv ? csvBodies(route, context, path, csv) : anyFileBodies(route, context, path)).map((arbitrary) => ({ arbitrary, weight: 1 })));
  if (route.contentTypes.length === 0 && route.template.includes('{')) {
    const arbitrary = fc.tuple(pathIds(route, context), fc.jsonValue({ maxDepth: 2 })).map(([[id, wrongPath], junk]) => ({ kind: `path id "${id}"`, method: route.method, path: wrongPath, headers: JSON_TYPE, body: JSON.stringify(junk) }));
    kinds.push({ arbitrary, weight: 1 });
  }
  if (kinds.length === 0) throw new Error(`no way to fuzz ${route.method} ${route.template}: give the suite a base body for it`);
  return fc.tuple(fc.oneof(...kinds), junkQuery).map(([request, query]) => ({ ...request, path: request.path + query }));
}

function csvBodies(route: WriteRoute, context: FuzzContext, path: string, csv: string): fc.Arbitrary<FuzzRequest>[] {
  return csvCases(csv, context.importLimitBytes).map((arb) =>
    arb.map((c): FuzzRequest => ({ kind: c.kind, method: route.method, path, headers: c.contentType === '' ? {} : { 'content-type': c.contentType ?? 'text/csv' }, body: c.body })),
  );
}

/**
 * For a file route the suite has no valid file for: cases that are wrong whatever the file's
 * layout (bad bytes in text, bytes that are no archive, a body past the limit, other media types).
 */
function anyFileBodies(route: WriteRoute, context: FuzzContext, path: string): fc.Arbitrary<FuzzRequest>[] {
  const type = route.contentTypes[0]!;
  const request = (kind: string, body: string | Uint8Array, contentType?: string): FuzzRequest => ({ kind, method: route.method, path, headers: contentType ? { 'content-type': contentType } : {}, body });
  const others = ['text/plain', `${type}; charset=iso-8859-1`, 'application/octet-stream', 'application/json', undefined].filter((t) => t !== type);
  const contents = type.startsWith('text/')
    ? fc.tuple(fc.string({ maxLength: 30 }), fc.constantFrom(...BAD_BYTES)).map(([text, bad]) => request('file: invalid UTF-8', new Uint8Array([...new TextEncoder().encode(`a,b\n${text}`), ...bad]), type))
    : fc.oneof(
        fc.uint8Array({ maxLength: 200 }).map((bytes) => request('file: random bytes', bytes, type)),
        fc.string({ maxLength: 200 }).map((text) => request('file: compressed junk', new Uint8Array(gzipSync(text)), type)),
        fc.nat({ max: 40 }).map((n) => request('file: truncated archive', new Uint8Array(gzipSync('{"kind":"archive"}\n'.repeat(50))).subarray(0, n), type)),
      );
  return [
    contents,
    fc.integer({ min: 1, max: 4096 }).map((extra) => request('file: oversized', 'x,'.repeat(Math.ceil((limitOf(route, context) + extra) / 2)), type)),
    fc.constantFrom(...others).map((other) => request(`file as "${other ?? ''}"`, 'a,b\n1,2\n', other)),
  ];
}
