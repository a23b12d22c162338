import type { JsonSchema } from './fuzzRouteTable.ts';

export type Json = null | boolean | number | string | Json[] | { [key: string]: Json };

/** Ids of records that exist, by the property names request bodies use for them. */
export type KnownIds = Record<string, string>;

const FALLBACK_UUID = '7d1c0e52-5b9a-4c3e-8f21-6a0b9e4d2c17';

function numberWithin(schema: JsonSchema): number {
  const low = (schema.minimum as number | undefined) ?? (schema.exclusiveMinimum as number | undefined);
  const high = (schema.maximum as number | undefined) ?? (schema.exclusiveMaximum as number | undefined);
  let value = low !== undefined && high !== undefined ? (low + high) / 2 : low !== undefined ? low + 1 : high !== undefined ? Math.min(0, high - 1) : 1;
  if (schema.type === 'integer') value = Math.round(value);
  return value;
}

/**
 * A value that meets a JSON Schema: the schema's own example when it has one, else the simplest
 * value that passes. uuid properties take a known id of that name so the value can reach past
 * validation. Cross-field rules the schema cannot state are not attempted.
 */
export function validValue(schema: JsonSchema, resolve: (s: JsonSchema) => JsonSchema, ids: KnownIds, name = ''): Json {
  const s = resolve(schema);
  if (s.example !== undefined) return withKnownIds(s.example as Json, ids);
  if (s.enum) return s.enum[0] as Json;
  if (s.const !== undefined) return s.const as Json;
  const branch = s.oneOf?.[0] ?? s.anyOf?.[0];
  if (branch) return validValue(branch, resolve, ids, name);
  const type = Array.isArray(s.type) ? s.type.find((t) => t !== 'null') : s.type;
  switch (type) {
    case 'object': {
      const out: Record<string, Json> = {};
      for (const key of s.required ?? []) out[key] = validValue(s.properties?.[key] ?? {}, resolve, ids, key);
      return out;
    }
    case 'array':
      return Array.from({ length: (s.minItems as number | undefined) ?? 1 }, () => validValue(s.items ?? {}, resolve, ids, name));
    case 'string':
      if (s.format === 'uuid') return ids[name] ?? FALLBACK_UUID;
      if (s.format === 'date-time') return '2026-11-21T14:05:00Z';
      return 'x'.repeat(Math.max(1, (s.minLength as number | undefined) ?? 1));
    case 'number':
    case 'integer':
      return numberWithin(s);
    case 'boolean':
      return true;
    default:
      return null;
  }
}

function withKnownIds(value: Json, ids: KnownIds): Json {
  if (Array.isArray(value)) return value.map((v) => withKnownIds(v, ids));
  if (value === null || typeof value !== 'object') return value;
  return Object.fromEntries(Object.entries(value).map(([k, v]) => [k, typeof v === 'string' && ids[k] ? ids[k] : withKnownIds(v, ids)]));
}
