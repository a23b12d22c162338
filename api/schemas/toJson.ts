/** The JSON shape of a value: Dates become ISO strings, as JSON.stringify writes them. */
export type Jsonify<T> = T extends Date
  ? string
  : T extends (infer U)[]
    ? Jsonify<U>[]
    : T extends object
      ? { [K in keyof T]: Jsonify<T[K]> }
      : T;

function plain(value: unknown): unknown {
  if (value instanceof Date) return value.toJSON();
  if (Array.isArray(value)) return value.map(plain);
  if (value === null || typeof value !== 'object') return value;
  const out: Record<string, unknown> = {};
  for (const key of Object.keys(value)) out[key] = plain((value as Record<string, unknown>)[key]);
  return out;
}

/**
 * Serialises rows for a typed response; Dates become ISO strings exactly as the wire has them.
 * A walk rather than a JSON round trip, since c.json stringifies the answer once more anyway.
 */
export function toJson<T>(value: T): Jsonify<T> {
  return plain(value) as Jsonify<T>;
}
