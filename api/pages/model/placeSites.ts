import type { DecisionName } from '../shell/DecisionBadge.tsx';

export interface SketchSite {
  label: string;
  decision: DecisionName;
  x: number;
  y: number;
}

// Anchor points in the 520 × 220 sketch box of ModelSketch.
const NOTCH_ROOTS: Record<string, { upper: [number, number]; lower: [number, number] }> = {
  opposite_rounded_notches: { upper: [260, 90], lower: [260, 130] },
  opposite_sharp_sawn_notches: { upper: [260, 90], lower: [260, 130] },
  sharp_notches_with_relief_notches: { upper: [260, 90], lower: [260, 130] },
};
const CENTRES: Record<string, [number, number]> = { calibration_disk: [260, 110], compact_tension: [280, 110] };

/**
 * Where each site's marker goes: notch roots at the upper or lower notch by their label (the
 * lab names them so), machined edges along the top edge, the rest spread along the middle.
 * Sites that share an anchor are fanned out so no marker hides another.
 *
 * @example
 * placeSites('opposite_rounded_notches', [{ label: 'lower notch root', kind: 'notch_root', decision: 'conforming' }]);
 * // [{ label: 'lower notch root', decision: 'conforming', x: 260, y: 130 }]
 */
export function placeSites(geometryKind: string, sites: readonly { label: string; kind: string; decision: DecisionName }[]): SketchSite[] {
  const used = new Map<string, number>();
  let spread = 0;
  return sites.map((site) => {
    const roots = NOTCH_ROOTS[geometryKind];
    let anchor: [number, number];
    if (roots && site.kind === 'notch_root') anchor = /lower|bottom/i.test(site.label) ? roots.lower : roots.upper;
    else if (CENTRES[geometryKind] && (site.kind === 'calibration_point' || site.kind === 'notch_root' || site.kind === 'interior')) anchor = CENTRES[geometryKind]!;
    else if (site.kind === 'machined_edge') anchor = [90 + 70 * (spread++ % 6), 40];
    else anchor = [80 + 60 * (spread++ % 7), 110];
    const key = anchor.join(',');
    const seen = used.get(key) ?? 0;
    used.set(key, seen + 1);
    // Fan repeats sideways; notch roots are close together vertically, so sideways is free.
    const x = anchor[0] + (seen === 0 ? 0 : (seen % 2 === 1 ? 1 : -1) * 26 * Math.ceil(seen / 2));
    return { label: site.label, decision: site.decision, x, y: anchor[1] };
  });
}
