import { describe, expect, it } from 'vitest';
import { normaliseOvenLog } from '../../../src/annealing/normaliseOvenLog.ts';

describe('normaliseOvenLog', () => {
  it('counts hours from the first timestamp, ISO text or epoch ms', () => {
    expect(normaliseOvenLog([
      { timestamp: '2026-03-02T08:00:00Z', temperatureC: 22 },
      { timestamp: Date.parse('2026-03-02T08:30:00Z'), temperatureC: 31 },
    ])).toEqual({ elapsedH: [0, 0.5], temperatureC: [22, 31] });
  });

  it('lists bad samples by row and refuses too short a log', () => {
    expect(() => normaliseOvenLog([{ elapsedH: 0, temperatureC: 20 }])).toThrow(expect.objectContaining({ code: 'invalid_input' }));
    expect(() => normaliseOvenLog([{ elapsedH: 0, temperatureC: 20 }, { elapsedH: 1, temperatureC: Number.NaN }])).toThrow(
      expect.objectContaining({ code: 'invalid_input', problems: [expect.objectContaining({ field: 'temperatureC', row: 1 })] }),
    );
  });

  it('allows repeated times but refuses time running backwards', () => {
    expect(normaliseOvenLog([{ elapsedH: 0, temperatureC: 20 }, { elapsedH: 0, temperatureC: 20.1 }]).elapsedH).toEqual([0, 0]);
    expect(() => normaliseOvenLog([{ elapsedH: 1, temperatureC: 20 }, { elapsedH: 0.9, temperatureC: 20 }])).toThrow(
      expect.objectContaining({ code: 'implausible_value' }),
    );
  });
});
