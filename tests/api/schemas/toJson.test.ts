import { describe, expect, it } from 'vitest';
import { toJson } from '../../../api/schemas/toJson.ts';

// The reference is JSON itself: JSON.stringify writes a Date by Date.prototype.toJSON, i.e.
// toISOString (ECMAScript specification, Date.prototype.toJSON and JSON.stringify).
const viaJson = (value: unknown) => JSON.parse(JSON.stringify(value));

describe('toJson', () => {
  it('gives what a JSON round trip gives for rows with dates, nesting, nulls and arrays', () => {
    const row = {
      id: 'a5c1',
      observedAt: new Date('2026-11-21T14:05:00.123Z'),
      loadN: null,
      fringeOrder: 1.25,
      rawInputs: { method: 'tardy', lowerOrder: 1, nested: [new Date(0), { at: new Date('2026-01-02T03:04:05Z') }] },
      tags: ['a', 'b'],
      flag: false,
    };
    expect(toJson(row)).toEqual(viaJson(row));
    expect(toJson([row, row])).toEqual(viaJson([row, row]));
    expect(toJson(row).observedAt).toBe('2026-11-21T14:05:00.123Z');
  });

  it('writes an invalid date as null, as JSON does, and leaves plain values alone', () => {
    expect(toJson({ at: new Date(Number.NaN) })).toEqual({ at: null });
    expect(toJson('text')).toBe('text');
    expect(toJson(3)).toBe(3);
    expect(toJson(null)).toBeNull();
  });
});
