import { describe, expect, it } from 'vitest';
import { DomainError } from '../../../src/errors/DomainError.ts';
import { CAST_ACRYLIC_GUIDANCE } from '../../../src/annealing/castAcrylicGuidance.ts';
import { validateGuidanceEntry } from '../../../src/annealing/validateGuidanceEntry.ts';

const fields = (bad: unknown): string[] => {
  try {
    validateGuidanceEntry(bad);
  } catch (e) {
    expect(e).toBeInstanceOf(DomainError);
    expect((e as DomainError).code).toBe('invalid_input');
    return (e as DomainError).problems.map((p) => p.field);
  }
  throw new Error('expected a DomainError');
};

const clone = () => JSON.parse(JSON.stringify(CAST_ACRYLIC_GUIDANCE));

describe('validateGuidanceEntry', () => {
  it("accepts a lab's own entry in the same shape", () => {
    const own = { ...clone(), key: 'cast-acrylic-sheet.lab-b-oven-2', title: 'Our slower variant' };
    own.cooling[0].rate = { kind: 'fixed', rateCPerH: { value: 5, source: { document: 'Lab B procedure AN-3', locator: 'clause 4.2', flag: 'read' } } };
    expect(validateGuidanceEntry(own).key).toBe('cast-acrylic-sheet.lab-b-oven-2');
  });

  it('refuses a number without its source, a bad flag and a malformed key, listing each field', () => {
    const bad = clone();
    bad.key = 'Acrylic';
    delete bad.soak.time.minimumH.source;
    bad.thermalDiffusivityMm2PerS.source.flag = 'guess';
    expect(fields(bad)).toEqual(['key', 'soak.time.minimumH.source', 'thermalDiffusivityMm2PerS.source.flag']);
  });

  it('refuses overlapping table rows, a value outside its range and an unknown target kind', () => {
    const bad = clone();
    bad.cooling[0].rate.rows[1].minThicknessMm = 3;
    bad.cooling[0].to.temperatureC.value = 60;
    bad.soak.temperature = { kind: 'somewhere' };
    expect(fields(bad)).toEqual(['soak.temperature.kind', 'cooling[0].rate.rows[1]', 'cooling[0].to.temperatureC.value']);
  });

  it('refuses a non-object and a zero rate', () => {
    expect(fields(null)).toEqual(['(entry)']);
    const bad = clone();
    bad.heatingRateToSoak = { kind: 'fixed', rateCPerH: { value: 0, source: bad.soak.time.minimumH.source } };
    expect(fields(bad)).toEqual(['heatingRateToSoak.rateCPerH.value']);
  });
});
