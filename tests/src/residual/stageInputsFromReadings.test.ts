import { describe, expect, it } from 'vitest';
import { stageInputsFromReadings, type RecordedReading } from '../../../src/residual/stageInputsFromReadings.ts';

const at = (day: number) => new Date(Date.UTC(2026, 10, day));
const reading = (over: Partial<RecordedReading>): RecordedReading => ({
  id: `r${Math.random()}`,
  stage: 'before_load',
  observedAt: at(1),
  fringeOrder: 0.2,
  fringeOrderUncertainty: 0.01,
  wavelengthNm: 577,
  sign: 'unknown',
  loadN: null,
  ...over,
});

describe('stageInputsFromReadings', () => {
  it('keeps the retardation: an order read at 546.1 nm becomes N·546.1/577 at 577 nm [C: δ = N·λ, ASTM D4093]', () => {
    const { stages } = stageInputsFromReadings([reading({ fringeOrder: 0.2, wavelengthNm: 546.1 })], 577);
    expect(stages.fabrication?.order.value).toBeCloseTo((0.2 * 546.1) / 577, 12);
    expect(stages.fabrication?.order.uncertainty).toBeCloseTo((0.01 * 546.1) / 577, 12);
  });

  it('uses the latest reading of each stage and signs known signs', () => {
    const out = stageInputsFromReadings(
      [
        reading({ id: 'old', observedAt: at(1), fringeOrder: 0.3 }),
        reading({ id: 'new', observedAt: at(2), fringeOrder: 0.25, sign: 'negative' }),
        reading({ id: 'load', stage: 'under_load', observedAt: at(3), fringeOrder: 4, loadN: 600 }),
      ],
      577,
    );
    expect(out.readingIds.fabrication).toBe('new');
    expect(out.stages.fabrication).toEqual({ order: { value: -0.25, uncertainty: 0.01 }, signKnown: true });
    expect(out.stages.underLoad?.loadN).toBe(600);
    expect(out.current?.readingId).toBe('new');
  });

  it('takes the latest unloaded reading, inspections included, as what the model carries now', () => {
    const out = stageInputsFromReadings(
      [reading({ id: 'fab', observedAt: at(1) }), reading({ id: 'look', stage: 'inspection', observedAt: at(9), fringeOrder: 0.4 }), reading({ id: 'load', stage: 'under_load', observedAt: at(10), loadN: 10 })],
      577,
    );
    expect(out.current).toMatchObject({ readingId: 'look', stage: 'inspection' });
    expect(out.readingIds).not.toHaveProperty('inspection');
  });

  it('refuses a reading under load without its load', () => {
    expect(() => stageInputsFromReadings([reading({ stage: 'under_load', loadN: null })], 577)).toThrow(/loadN/);
  });
});
