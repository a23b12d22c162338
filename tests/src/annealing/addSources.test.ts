import { describe, expect, it } from 'vitest';
import type { SourceRef } from '../../../src/annealing/AnnealingGuidance.ts';
import { addSources } from '../../../src/annealing/addSources.ts';
import { CAST_ACRYLIC_GUIDANCE } from '../../../src/annealing/castAcrylicGuidance.ts';
import { soakRuleDuration } from '../../../src/annealing/soakRuleDuration.ts';

const ref = (document: string, locator: string, flag: SourceRef['flag'] = 'read'): SourceRef => ({ document, locator, flag });

describe('addSources', () => {
  it('keeps one entry per document, locator and flag, in order of first appearance', () => {
    const seen = new Map<string, SourceRef>();
    addSources(seen, [ref('Handbook', 'Table 2'), ref('Standard', '§4')]);
    addSources(seen, [ref('Handbook', 'Table 2'), ref('Paper', 'Fig. 3'), ref('Standard', '§4')]);
    expect([...seen.values()]).toEqual([ref('Handbook', 'Table 2'), ref('Standard', '§4'), ref('Paper', 'Fig. 3')]);
  });

  it('keeps the same document apart when its locator or its flag differs', () => {
    const seen = new Map<string, SourceRef>();
    addSources(seen, [ref('Handbook', 'Table 2'), ref('Handbook', 'Table 3'), ref('Handbook', 'Table 2', 'from_memory')]);
    expect(seen.size).toBe(3);
  });

  it('does not merge entries whose fields only join to the same text', () => {
    const seen = new Map<string, SourceRef>();
    addSources(seen, [ref('A B', 'C'), ref('A', 'B C')]);
    expect(seen.size).toBe(2);
  });

  it('leaves the map as it was for an empty list', () => {
    const seen = new Map<string, SourceRef>([['k', ref('Handbook', 'Table 2')]]);
    addSources(seen, []);
    expect([...seen.entries()]).toEqual([['k', ref('Handbook', 'Table 2')]]);
  });

  it('lists the makers’ acrylic soak rule once, though both of its numbers cite it [R: makers’ guidance, 1 h per mm, at least 2 h]', () => {
    const rule = soakRuleDuration(CAST_ACRYLIC_GUIDANCE.soak.time, 12);
    expect(rule.sources).toHaveLength(2);
    const seen = new Map<string, SourceRef>();
    addSources(seen, rule.sources);
    expect([...seen.values()].map((s) => s.document)).toEqual(["Cast acrylic sheet makers' fabrication guidance"]);
  });
});
