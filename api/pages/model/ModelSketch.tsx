import type { DecisionName } from '../shell/DecisionBadge.tsx';
import { placeSites, type SketchSite } from './placeSites.ts';

export interface SketchProps {
  geometryKind: string;
  sites: { label: string; kind: string; decision: DecisionName }[];
}

const W = 520;
const H = 220;

/** The body outline of each geometry kind, drawn in a 520 × 220 box; not to scale. */
function outline(kind: string) {
  switch (kind) {
    case 'opposite_rounded_notches':
      // Strip with two U-notches facing each other at mid-length.
      return <path class="body" d="M20 40 H230 V70 A30 30 0 0 0 290 70 V40 H500 V180 H290 V150 A30 30 0 0 0 230 150 V180 H20 Z" />;
    case 'opposite_sharp_sawn_notches':
      return <path class="body" d="M20 40 H248 L260 100 L272 40 H500 V180 H272 L260 120 L248 180 H20 Z" />;
    case 'sharp_notches_with_relief_notches':
      return <path class="body" d="M20 40 H190 L200 70 L210 40 H248 L260 100 L272 40 H310 L320 70 L330 40 H500 V180 H330 L320 150 L310 180 H272 L260 120 L248 180 H210 L200 150 L190 180 H20 Z" />;
    case 'compact_tension':
      return (
        <g>
          <path class="body" d="M150 20 H400 V200 H150 V116 H260 L280 110 L260 104 H150 Z" />
          <circle class="body" cx="205" cy="60" r="16" />
          <circle class="body" cx="205" cy="160" r="16" />
        </g>
      );
    case 'calibration_disk':
      return (
        <g>
          <circle class="body" cx="260" cy="110" r="90" />
          <path class="site" d="M260 0 V16 M252 8 L260 18 L268 8 M260 220 V204 M252 212 L260 202 L268 212" />
        </g>
      );
    case 'bending_beam':
      return (
        <g>
          <rect class="body" x="20" y="80" width="480" height="60" />
          <path class="site" d="M60 140 L50 160 H70 Z M460 140 L450 160 H470 Z" />
        </g>
      );
    default:
      return <rect class="body" x="20" y="60" width="480" height="100" />;
  }
}

function Marker({ site, n }: { site: SketchSite; n: number }) {
  return (
    <g>
      <circle class={`site site-${site.decision}`} cx={site.x} cy={site.y} r="11" />
      <text x={site.x} y={site.y + 4} text-anchor="middle">{String(n)}</text>
    </g>
  );
}

/**
 * A schematic of the model with its sites numbered and filled by their decision; the legend
 * beside it names each number, so the drawing never has to carry the words.
 */
export function ModelSketch({ geometryKind, sites }: SketchProps) {
  const placed = placeSites(geometryKind, sites);
  return (
    <figure>
      <svg class="sketch" viewBox={`0 0 ${W} ${H}`} role="img" aria-label={`Sketch of a ${geometryKind.replaceAll('_', ' ')} model with ${sites.length} sites`}>
        {outline(geometryKind)}
        {placed.map((s, i) => <Marker site={s} n={i + 1} />)}
      </svg>
      <figcaption class="note">Schematic, not to scale. Markers: white not yet read, green fit, amber undecided, red anneal first.</figcaption>
    </figure>
  );
}
