import { describe, expect, it } from 'vitest';
import type { AnnealingGuidanceEntry, SourceRef } from '../../../src/annealing/AnnealingGuidance.ts';
import { ANNEALING_CAUTIONS, ANNEALING_GUIDANCE_CATALOGUE } from '../../../src/annealing/guidanceCatalogue.ts';
import { validateGuidanceEntry } from '../../../src/annealing/validateGuidanceEntry.ts';

const entry = (key: string): AnnealingGuidanceEntry => ANNEALING_GUIDANCE_CATALOGUE.entries.find((e) => e.key === key)!;

/** Every source object in an entry, wherever it sits. */
function allSources(value: unknown, out: SourceRef[] = []): SourceRef[] {
  if (Array.isArray(value)) value.forEach((v) => allSources(v, out));
  else if (typeof value === 'object' && value !== null) {
    const o = value as Record<string, unknown>;
    if (typeof o.document === 'string' && typeof o.flag === 'string') out.push(o as unknown as SourceRef);
    else Object.values(o).forEach((v) => allSources(v, out));
  }
  return out;
}

describe('ANNEALING_GUIDANCE_CATALOGUE', () => {
  it('is versioned, JSON-serialisable, and every entry passes validation with a unique key', () => {
    expect(ANNEALING_GUIDANCE_CATALOGUE.version).toBe('2026-12-01.1');
    expect(JSON.parse(JSON.stringify(ANNEALING_GUIDANCE_CATALOGUE))).toEqual(ANNEALING_GUIDANCE_CATALOGUE);
    for (const e of ANNEALING_GUIDANCE_CATALOGUE.entries) expect(validateGuidanceEntry(e)).toBe(e);
    const keys = ANNEALING_GUIDANCE_CATALOGUE.entries.map((e) => e.key);
    expect(new Set(keys).size).toBe(keys.length);
    expect(new Set(ANNEALING_GUIDANCE_CATALOGUE.entries.map((e) => e.materialFamily))).toEqual(
      new Set(['cast_acrylic', 'polycarbonate', 'epoxy_anhydride', 'soda_lime_glass']),
    );
  });

  it('cast acrylic: 80 °C, 1 h/mm, at least 2 h, table to 49 °C, t/4 h above 8 mm, all read in the makers’ guidance [R]', () => {
    const e = entry('cast-acrylic-sheet.maker-guidance');
    expect(e.soak.temperature).toMatchObject({ kind: 'absolute', temperatureC: { value: 80, source: { flag: 'read' } } });
    expect(e.soak.time).toMatchObject({ hoursPerMm: { value: 1 }, minimumH: { value: 2 } });
    const cooling = e.cooling[0]!;
    expect(cooling.rate).toMatchObject({ kind: 'thickness_table', source: { flag: 'read' } });
    if (cooling.rate.kind === 'thickness_table') expect(cooling.rate.rows.map((r) => r.rateCPerH)).toEqual([78, 30, 14, 10, 6.7, 5.6]);
    expect(cooling.minimumDuration).toMatchObject({ hoursPerMm: { value: 0.25 }, appliesAboveThicknessMm: { value: 8 } });
    // The reference sheet flags PMMA diffusivity 0.109 mm²/s as read [R].
    expect(e.thermalDiffusivityMm2PerS).toMatchObject({ value: 0.109, source: { flag: 'read' } });
  });

  it('flags follow the reference sheet: Zakeri read, common polycarbonate and epoxy practice from memory, glass points read, derived constants derived', () => {
    expect(allSources(entry('polycarbonate-sheet.zakeri-2013')).filter((s) => s.document.startsWith('Zakeri')).every((s) => s.flag === 'read')).toBe(true);
    const practice = allSources(entry('polycarbonate-sheet.common-practice')).filter((s) => s.document.startsWith('Common annealing practice'));
    expect(practice.length).toBeGreaterThan(0);
    expect(practice.every((s) => s.flag === 'from_memory')).toBe(true);
    expect(allSources(entry('epoxy-anhydride-cast.handbook-practice')).filter((s) => s.document.startsWith('Experimental')).every((s) => s.flag === 'from_memory')).toBe(true);
    const glass = entry('soda-lime-glass.annealing-point');
    expect(glass.soak.temperature).toMatchObject({ reference: 'annealing_point', referenceTemperatureC: { value: 546, range: [546, 548], source: { flag: 'read' } } });
    expect(glass.cooling[0]!.rate).toMatchObject({ kind: 'inverse_square', constantCMm2PerH: { source: { flag: 'derived' } } });
    // Allowed gradients are working values: no document gives them.
    for (const e of ANNEALING_GUIDANCE_CATALOGUE.entries) expect(e.allowedGradientC.source.flag).toBe('common_practice');
  });

  it('the Zakeri 2013 entry encodes 20 °C/h to 100 °C (3 h), 5 °C/h to 140 °C, 1 °C/h to 156 °C, and the drying table [R]', () => {
    const e = entry('polycarbonate-sheet.zakeri-2013');
    expect(e.heating.map((h) => [h.rate.kind === 'fixed' ? h.rate.rateCPerH.value : null, h.to.kind === 'absolute' ? h.to.temperatureC.value : null, h.hold?.minimumH.value ?? null])).toEqual([
      [20, 100, 3],
      [5, 140, null],
    ]);
    expect(e.heatingRateToSoak).toMatchObject({ kind: 'fixed', rateCPerH: { value: 1 } });
    expect(e.preSteps?.[0]?.rows.map((r) => [r.thicknessMm, r.durationH])).toEqual([[1, 1.5], [2, 4], [3, 7], [4, 12], [5, 18], [6, 26], [8, 45]]);
  });

  it('names no source without a document and locator', () => {
    for (const e of ANNEALING_GUIDANCE_CATALOGUE.entries) {
      for (const s of allSources(e)) {
        expect(s.document.length).toBeGreaterThan(5);
        expect(s.locator.length).toBeGreaterThan(3);
      }
    }
  });
});

describe('ANNEALING_CAUTIONS', () => {
  it.each([/hot/i, /vapour|fume/i, /overshoot|distort/i, /ignite|fire/i, /brittle|crack/i, /safety rules.*local codes.*licensed practice/i])('covers %s', (theme) => {
    expect(ANNEALING_CAUTIONS.some((c) => theme.test(c))).toBe(true);
  });
});
