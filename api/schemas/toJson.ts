/** The JSON shape of a value: Dates become ISO strings, as JSON.stringify writes them. */
export type Jsonify<T> = T extends Date
  ? string
  : T extends (infer U)[]
    ? Jsonify<U>[]
    : T extends object
      ? { [K in keyof T]: Jsonify<T[K]> }
      : T;

/** Serialises rows for a typed response; Dates become ISO strings exactly as the wire has them. */
export function toJson<T>(value: T): Jsonify<T> {
  return JSON.parse(JSON.stringify(value)) as Jsonify<T>;
}
