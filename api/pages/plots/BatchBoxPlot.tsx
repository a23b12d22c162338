import { scaleBand, scaleLinear } from 'd3-scale';
import { PLOT_MARGINS, PLOT_SIZE, PlotFrame } from './PlotFrame.tsx';

export interface BoxGroup {
  key: string;
  readingCount: number;
  modelCount: number;
  /** 5th, 25th, 50th, 75th and 95th percentiles; null where the group has no readings. */
  p05: number | null;
  q1: number | null;
  median: number | null;
  q3: number | null;
  p95: number | null;
}

// More boxes than this no longer fit the width legibly; the table beside the plot lists all.
export const MAX_BOXES = 16;

/** One box per batch: quartiles as the box, 5–95 % as whiskers, the limit as a dashed line. */
export function BatchBoxPlot({ groups, limit, unit, title }: { groups: BoxGroup[]; limit: number | null; unit: string; title: string }) {
  const drawn = groups.filter((g) => g.median !== null).slice(0, MAX_BOXES);
  if (drawn.length === 0) return <p class="note">{title}: no readings at this stage.</p>;
  const { width, height } = PLOT_SIZE;
  const m = PLOT_MARGINS;
  const x = scaleBand<string>().domain(drawn.map((g) => g.key)).range([m.left, width - m.right]).padding(0.35);
  const highs = drawn.map((g) => g.p95 ?? g.median!);
  const y = scaleLinear().domain([0, Math.max(...highs, limit ?? 0) * 1.05 || 1]).nice().range([height - m.bottom, m.top]);
  const band = x.bandwidth();
  const categories = drawn.map((g) => ({ label: g.key, at: x(g.key)! + band / 2 }));
  // A band scale has no ticks; the frame only needs the range and a no-op tick list here.
  const xAxis = Object.assign((v: number) => v, { ticks: () => [] as number[], range: () => x.range() });
  return (
    <figure>
      <PlotFrame title={title} x={xAxis} y={y} xLabel="Batch" yLabel={unit} formatX={String} xCategories={categories}>
        {limit !== null && <line class="limit" x1={m.left} x2={width - m.right} y1={y(limit)} y2={y(limit)} />}
        {drawn.map((g) => {
          const left = x(g.key)!;
          const mid = left + band / 2;
          const [lo, q1, med, q3, hi] = [g.p05 ?? g.median!, g.q1 ?? g.median!, g.median!, g.q3 ?? g.median!, g.p95 ?? g.median!];
          return (
            <g>
              <title>{`${g.key}: median ${med.toPrecision(3)}, quartiles ${q1.toPrecision(3)} to ${q3.toPrecision(3)}, ${g.readingCount} readings on ${g.modelCount} models`}</title>
              <line class="whisker" x1={mid} x2={mid} y1={y(lo)} y2={y(hi)} />
              <line class="whisker" x1={mid - band / 4} x2={mid + band / 4} y1={y(lo)} y2={y(lo)} />
              <line class="whisker" x1={mid - band / 4} x2={mid + band / 4} y1={y(hi)} y2={y(hi)} />
              <rect class="box" x={left} width={band} y={y(q3)} height={Math.max(1, y(q1) - y(q3))} />
              <line class="median" x1={left} x2={left + band} y1={y(med)} y2={y(med)} />
            </g>
          );
        })}
      </PlotFrame>
      <figcaption class="note">Box: 25–75 %, bar: median, whiskers: 5–95 % of the readings in each batch{limit !== null ? `; dashed: limit ${limit}` : ''}{groups.length > drawn.length ? `; first ${drawn.length} of ${groups.length} batches drawn` : ''}.</figcaption>
    </figure>
  );
}
