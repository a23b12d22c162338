import { describe, expect, it } from 'vitest';
import type { SourceRef, TemperatureTarget } from '../../../src/annealing/AnnealingGuidance.ts';
import { CAST_ACRYLIC_GUIDANCE } from '../../../src/annealing/castAcrylicGuidance.ts';
import { CAST_EPOXY_GUIDANCE } from '../../../src/annealing/castEpoxyGuidance.ts';
import { POLYCARBONATE_ZAKERI_2013 } from '../../../src/annealing/polycarbonateGuidance.ts';
import { resolveTemperatureTarget } from '../../../src/annealing/resolveTemperatureTarget.ts';
import { SODA_LIME_GLASS_GUIDANCE } from '../../../src/annealing/sodaLimeGlassGuidance.ts';

const S: SourceRef = { document: 'Invented', locator: 'test', flag: 'common_practice' };

describe('resolveTemperatureTarget', () => {
  it('passes an absolute target through: the 80 °C acrylic soak [R: makers’ guidance]', () => {
    const target = CAST_ACRYLIC_GUIDANCE.soak.temperature;
    expect(resolveTemperatureTarget(target, 23)).toEqual({
      temperatureC: 80,
      description: '80 °C',
      sources: [(target as Extract<TemperatureTarget, { kind: 'absolute' }>).temperatureC.source],
    });
  });

  it('adds a positive offset to the reference point: epoxy soak at Tg 130 + 10 = 140 °C [M: handbook practice; Tg R: property table]', () => {
    const r = resolveTemperatureTarget(CAST_EPOXY_GUIDANCE.soak.temperature, 23);
    expect(r.temperatureC).toBe(140);
    expect(r.description).toBe('Tg 130 °C + 10 °C');
    expect(r.sources.map((s) => s.flag)).toEqual(['read', 'from_memory']);
  });

  it('writes a negative offset with a minus sign and its size: epoxy cooling to Tg − 40 = 90 °C [M: handbook practice]', () => {
    const r = resolveTemperatureTarget(CAST_EPOXY_GUIDANCE.cooling[0]!.to, 23);
    expect(r.temperatureC).toBe(90);
    expect(r.description).toBe('Tg 130 °C − 40 °C');
  });

  it('names glass reference points: annealing point 546 °C + 0, strain point 511 − 10 = 501 °C [R: glass annealing and strain points]', () => {
    const soak = resolveTemperatureTarget(SODA_LIME_GLASS_GUIDANCE.soak.temperature, 23);
    expect(soak).toMatchObject({ temperatureC: 546, description: 'annealing point 546 °C + 0 °C' });
    const strain = SODA_LIME_GLASS_GUIDANCE.cooling.map((c) => resolveTemperatureTarget(c.to, 23)).find((r) => r.description.startsWith('strain point'));
    expect(strain).toMatchObject({ temperatureC: 501, description: 'strain point 511 °C − 10 °C' });
  });

  it.each([
    ['deflection_temperature', 'deflection temperature 95 °C − 5 °C', 90],
    ['softening_point', 'softening point 95 °C − 5 °C', 90],
  ] as const)('describes %s by its trade name [C]', (reference, description, temperatureC) => {
    const target: TemperatureTarget = { kind: 'relative', reference, referenceTemperatureC: { value: 95, source: S }, offsetC: { value: -5, source: S } };
    expect(resolveTemperatureTarget(target, 23)).toEqual({ temperatureC, description, sources: [S, S] });
  });

  it('returns to the cycle’s own start temperature: cooling back to room temperature [R: Zakeri 2013, cool at the same rates]', () => {
    const last = POLYCARBONATE_ZAKERI_2013.cooling[POLYCARBONATE_ZAKERI_2013.cooling.length - 1]!.to;
    expect(resolveTemperatureTarget(last, 18.5)).toMatchObject({ temperatureC: 18.5, description: 'start temperature 18.5 °C' });
    expect(resolveTemperatureTarget(last, 25).temperatureC).toBe(25);
  });
});
