import fc from 'fast-check';
import type { JsonSchema } from './fuzzRouteTable.ts';
import { type Json, type KnownIds, validValue } from './fuzzValidValue.ts';

export const REMOVED = Symbol('removed');
export type Replacement = Json | typeof REMOVED;

/** One way to break a body at one place: the path, a label, and the values that break it. */
export interface Violation {
  path: (string | number)[];
  kind: string;
  value: fc.Arbitrary<Replacement>;
}

type Kind = 'null' | 'boolean' | 'number' | 'integer' | 'string' | 'array' | 'object';

const JUNK: Record<Exclude<Kind, 'integer'>, fc.Arbitrary<Json>> = {
  null: fc.constant(null),
  boolean: fc.boolean(),
  number: fc.oneof(fc.double({ noNaN: true, noDefaultInfinity: true }), fc.integer()),
  string: fc.oneof(fc.string({ maxLength: 12 }), fc.constantFrom('1', '6', 'true', 'null', '577 nm', '0x10')),
  array: fc.array(fc.jsonValue({ maxDepth: 1 }) as fc.Arbitrary<Json>, { maxLength: 3 }),
  object: fc.dictionary(fc.string({ maxLength: 6 }), fc.jsonValue({ maxDepth: 1 }) as fc.Arbitrary<Json>, { maxKeys: 3 }),
};

/** The JSON kinds a schema admits, or undefined when it does not say (anything goes). */
function admittedKinds(schema: JsonSchema, resolve: (s: JsonSchema) => JsonSchema): Set<Kind> | undefined {
  const s = resolve(schema);
  const branches = s.oneOf ?? s.anyOf;
  if (branches) {
    const all = new Set<Kind>();
    for (const b of branches) {
      const kinds = admittedKinds(b, resolve);
      if (!kinds) return undefined;
      kinds.forEach((k) => all.add(k));
    }
    return all;
  }
  if (s.enum) return new Set(s.enum.map((v) => (v === null ? 'null' : (typeof v as Kind))));
  if (!s.type) return undefined;
  return new Set((Array.isArray(s.type) ? s.type : [s.type]) as Kind[]);
}

function wrongType(kinds: Set<Kind>): fc.Arbitrary<Json> | undefined {
  const numeric = kinds.has('number') || kinds.has('integer');
  const options = (Object.keys(JUNK) as (keyof typeof JUNK)[]).filter((k) => (k === 'number' ? !numeric : !kinds.has(k))).map((k) => JUNK[k]);
  if (kinds.has('integer') && !kinds.has('number')) options.push(fc.double({ min: -1e6, max: 1e6, noNaN: true }).filter((x) => !Number.isInteger(x)));
  return options.length > 0 ? fc.oneof(...options) : undefined;
}

function numberViolations(s: JsonSchema, base: Json): [string, fc.Arbitrary<Json>][] {
  const out: [string, fc.Arbitrary<Json>][] = [];
  const max = s.maximum as number | undefined;
  const exclusiveMax = s.exclusiveMaximum as number | undefined;
  const min = s.minimum as number | undefined;
  const exclusiveMin = s.exclusiveMinimum as number | undefined;
  const ceiling = max ?? exclusiveMax;
  const floor = min ?? exclusiveMin;
  if (ceiling !== undefined) {
    // Filtered as well: the generator's own edge values (such as -0) can sit on the bound.
    out.push(['above maximum', fc.double({ min: ceiling, minExcluded: max !== undefined, max: Number.MAX_VALUE, noNaN: true }).filter((x) => (max !== undefined ? x > max : x >= ceiling))]);
    out.push(['huge number', fc.constantFrom(1e308, 2 ** 53 + 2, 1e21)]);
    if (typeof base === 'number' && base * 1000 > ceiling) out.push(['unit mistake ×1000', fc.constant(base * 1000)]);
  }
  if (floor !== undefined) {
    out.push(['below minimum', fc.double({ max: floor, maxExcluded: min !== undefined, min: -Number.MAX_VALUE, noNaN: true }).filter((x) => (min !== undefined ? x < min : x <= floor))]);
    if (typeof base === 'number' && base > 0 && base / 1000 < floor) out.push(['unit mistake ÷1000', fc.constant(base / 1000)]);
  }
  return out;
}

function stringViolations(s: JsonSchema): [string, fc.Arbitrary<Json>][] {
  const out: [string, fc.Arbitrary<Json>][] = [];
  const maxLength = s.maxLength as number | undefined;
  // Non-blank filler: labels are trimmed before their length is checked.
  if (maxLength !== undefined) out.push(['too long', fc.integer({ min: 1, max: 64 }).map((extra) => 'w'.repeat(maxLength + extra))]);
  if (((s.minLength as number | undefined) ?? 0) >= 1) out.push(['empty', fc.constant('')]);
  if (s.enum) out.push(['not in enum', fc.oneof(fc.string({ maxLength: 10 }), fc.constantFrom(...s.enum.map((v) => String(v).toUpperCase() + '_'))).filter((v) => !s.enum!.includes(v))]);
  if (s.format === 'uuid') out.push(['not a uuid', fc.constantFrom('not-a-uuid', '1234', '7d1c0e52-5b9a-4c3e-8f21-6a0b9e4d2c1', '7d1c0e52-5b9a-4c3e-8f21-6a0b9e4d2c17x', '')]);
  if (s.format === 'date-time') out.push(['not an instant', fc.constantFrom('yesterday', '2026-13-45T00:00:00Z', '2026-11-21', '2026-11-21T14:05:00', '21/11/2026 14:05', '')]);
  // PostgreSQL cannot store U+0000 in text or jsonb: a body carrying it must be refused, not cut.
  if (!s.enum && !s.format && !s.pattern) out.push(['NUL character', fc.constant('before\u0000after')]);
  return out;
}

/**
 * Every place where a body can be made invalid against its schema, walking present and absent
 * properties alike. Each violation is certain to fail the schema (a wrong kind, a bound crossed,
 * a required key gone, an unknown key on a closed object), so the API must refuse all of them.
 */
export function violationsOf(schema: JsonSchema, base: Json, resolve: (s: JsonSchema) => JsonSchema, ids: KnownIds, path: (string | number)[] = [], depth = 0): Violation[] {
  const s = resolve(schema);
  const out: Violation[] = [];
  const kinds = admittedKinds(s, resolve);
  const wrong = kinds && wrongType(kinds);
  if (wrong) out.push({ path, kind: 'wrong type', value: wrong });
  if (depth > 6) return out;
  const branches = s.oneOf ?? s.anyOf;
  if (branches) {
    const chosen = branches.map(resolve).find((b) => matchesDiscriminator(b, base));
    return chosen ? [...out, ...violationsOf(chosen, base, resolve, ids, path, depth)] : out;
  }
  if (kinds?.has('number') || kinds?.has('integer')) for (const [kind, value] of numberViolations(s, base)) out.push({ path, kind, value });
  if (kinds?.has('string')) for (const [kind, value] of stringViolations(s)) out.push({ path, kind, value });
  if (kinds?.has('object') && base !== null && typeof base === 'object' && !Array.isArray(base)) {
    const properties = s.properties ?? {};
    for (const key of s.required ?? []) out.push({ path: [...path, key], kind: 'missing required', value: fc.constant(REMOVED) });
    if (s.additionalProperties === false) {
      const unknownKey = fc.oneof(fc.string({ minLength: 1, maxLength: 10 }), fc.constantFrom('__proto__', 'constructor', 'labId', 'recordedByKeyId', 'supersededById'));
      out.push({ path, kind: 'unknown key', value: unknownKey.filter((k) => !(k in properties)).chain((k) => fc.jsonValue({ maxDepth: 1 }).map((v) => ({ ...base, [k]: v as Json }))) });
    } else if (typeof s.additionalProperties === 'object') {
      out.push(...violationsOf(s.additionalProperties, validValue(s.additionalProperties, resolve, ids), resolve, ids, [...path, 'fuzzKey'], depth + 1));
    }
    for (const [key, child] of Object.entries(properties)) {
      const childBase = key in base ? (base[key] as Json) : validValue(child, resolve, ids, key);
      out.push(...violationsOf(child, childBase, resolve, ids, [...path, key], depth + 1));
    }
  }
  if (kinds?.has('array') && Array.isArray(base)) {
    if (((s.minItems as number | undefined) ?? 0) >= 1) out.push({ path, kind: 'too few items', value: fc.constant([]) });
    const first = base[0] ?? (s.items ? validValue(s.items, resolve, ids) : undefined);
    if (s.items && first !== undefined) out.push(...violationsOf(s.items, first, resolve, ids, [...path, 0], depth + 1));
  }
  return out;
}

/** The branch of a discriminated union whose single-valued enum properties the value carries. */
function matchesDiscriminator(branch: JsonSchema, value: Json): boolean {
  if (value === null || typeof value !== 'object' || Array.isArray(value)) return false;
  const tags = Object.entries(branch.properties ?? {}).filter(([, p]) => p.enum?.length === 1);
  return tags.length > 0 && tags.every(([key, p]) => value[key] === p.enum![0]);
}

/** The body with one value replaced (or removed), creating the containers on the way. */
export function applyAt(base: Json, path: (string | number)[], replacement: Replacement): Json {
  if (path.length === 0) return replacement === REMOVED ? null : replacement;
  const [head, ...rest] = path;
  const container: Record<string, Json> | Json[] = Array.isArray(base) ? [...base] : base !== null && typeof base === 'object' ? { ...base } : {};
  const current = (container as Record<string, Json>)[head as string] ?? null;
  if (rest.length === 0 && replacement === REMOVED) {
    if (Array.isArray(container)) container.splice(head as number, 1);
    else delete container[head as string];
    return container;
  }
  (container as Record<string, Json>)[head as string] = applyAt(current, rest, replacement);
  return container;
}
