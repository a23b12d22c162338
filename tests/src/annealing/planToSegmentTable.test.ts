import { parse } from 'csv-parse/sync';
import { describe, expect, it } from 'vitest';
import { CAST_ACRYLIC_GUIDANCE } from '../../../src/annealing/castAcrylicGuidance.ts';
import { generateAnnealingPlan } from '../../../src/annealing/generateAnnealingPlan.ts';
import { planToSegmentTable } from '../../../src/annealing/planToSegmentTable.ts';
import { POLYCARBONATE_ZAKERI_2013 } from '../../../src/annealing/polycarbonateGuidance.ts';

describe('planToSegmentTable', () => {
  it('writes one row per segment that a CSV reader (csv-parse, reference library) reads back', () => {
    const csv = planToSegmentTable(generateAnnealingPlan({ guidance: POLYCARBONATE_ZAKERI_2013, maxSectionThicknessMm: 6 }));
    const rows = parse(csv, { columns: true }) as Record<string, string>[];
    // Zakeri 2013 [R]: 3.85 h = 3:51, 3 h, 8 h, 16 h, then the same rates back down.
    expect(rows).toEqual([
      { segment: '1', kind: 'ramp', target_c: '100', rate_c_per_h: '20', duration_h_mm: '3:51' },
      { segment: '2', kind: 'soak', target_c: '100', rate_c_per_h: '', duration_h_mm: '3:00' },
      { segment: '3', kind: 'ramp', target_c: '140', rate_c_per_h: '5', duration_h_mm: '8:00' },
      { segment: '4', kind: 'ramp', target_c: '156', rate_c_per_h: '1', duration_h_mm: '16:00' },
      { segment: '5', kind: 'ramp', target_c: '140', rate_c_per_h: '1', duration_h_mm: '16:00' },
      { segment: '6', kind: 'ramp', target_c: '100', rate_c_per_h: '5', duration_h_mm: '8:00' },
      { segment: '7', kind: 'ramp', target_c: '23', rate_c_per_h: '20', duration_h_mm: '3:51' },
    ]);
  });

  it('rounds soak minutes up, never keying a hold shorter than planned', () => {
    const plan = generateAnnealingPlan({ guidance: CAST_ACRYLIC_GUIDANCE, maxSectionThicknessMm: 6 });
    const soak = { ...plan.segments[1]!, durationH: 2 + 0.1 / 60 };
    expect(planToSegmentTable({ segments: [soak] })).toBe('segment,kind,target_c,rate_c_per_h,duration_h_mm\n2,soak,80,,2:01\n');
  });
});
