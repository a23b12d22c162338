import { scaleLinear, scaleUtc } from 'd3-scale';
import { area, line } from 'd3-shape';
import { binSeries } from './binSeries.ts';
import { PLOT_MARGINS, PLOT_SIZE, PlotFrame } from './PlotFrame.tsx';

/** The shape individualsMovingRangeChart answers, reduced to what the plot draws. */
export interface ControlChartData {
  centreLine: number;
  individuals: { upperLimit: number; lowerLimit: number };
  /** x: an ISO instant; rules: the run rules the point breaks (empty when none). */
  points: { x: string | number; value: number; rules: readonly string[] }[];
}

export type ControlChartInput = ({ defined: true } & ControlChartData) | { defined: false; reason: string };

/**
 * Individuals chart: the series over time, centre line and natural process limits, points
 * that break a run rule in the warning colour. Long series are binned (binSeries).
 */
export function ControlChartPlot({ chart, unit, title, xLabel = 'Observed (UTC)' }: { chart: ControlChartInput; unit: string; title: string; xLabel?: string }) {
  if (!chart.defined) return <p class="note">{title}: no chart ({chart.reason}).</p>;
  const { upperLimit, lowerLimit } = chart.individuals;
  const series = chart.points.map((p) => ({ x: typeof p.x === 'number' ? p.x : Date.parse(p.x), value: p.value, flagged: p.rules.length > 0 }));
  const drawn = binSeries(series);
  const { width, height } = PLOT_SIZE;
  const m = PLOT_MARGINS;
  const xs = series.map((p) => p.x);
  const [x0, x1] = [Math.min(...xs), Math.max(...xs)];
  // A little room either side so the first and last points do not sit on the axes.
  const pad = Math.max((x1 - x0) * 0.03, 1_800_000);
  const x = scaleUtc().domain([new Date(x0 - pad), new Date(x1 + pad)]).range([m.left, width - m.right]);
  const values = [...series.map((p) => p.value), upperLimit, lowerLimit, chart.centreLine];
  const y = scaleLinear().domain([Math.min(...values), Math.max(...values)]).nice().range([height - m.bottom, m.top]);
  const at = (ms: number) => x(new Date(ms));
  const pathOf = line<{ x: number; value: number }>().x((p) => at(p.x)).y((p) => y(p.value));
  const envelope = area<{ x: number; min: number; max: number }>().x((b) => at(b.x)).y0((b) => y(b.min)).y1((b) => y(b.max));
  const flaggedCount = series.filter((p) => p.flagged).length;
  return (
    <figure>
      <PlotFrame title={title} x={x} y={y} xLabel={xLabel} yLabel={unit} formatX={x.tickFormat(6)}>
        <line class="centre" x1={m.left} x2={width - m.right} y1={y(chart.centreLine)} y2={y(chart.centreLine)} />
        <line class="limit" x1={m.left} x2={width - m.right} y1={y(upperLimit)} y2={y(upperLimit)} />
        <line class="limit" x1={m.left} x2={width - m.right} y1={y(lowerLimit)} y2={y(lowerLimit)} />
        {drawn.binned ? (
          <>
            <path class="band" d={envelope(drawn.bins) ?? ''} />
            <path class="series" d={pathOf(drawn.bins.map((b) => ({ x: b.x, value: b.mean }))) ?? ''} />
          </>
        ) : (
          <path class="series" d={pathOf(drawn.points) ?? ''} />
        )}
        {drawn.points.map((p) => <circle class={p.flagged ? 'flagged' : 'point'} cx={at(p.x)} cy={y(p.value)} r={p.flagged ? 4 : 3} />)}
      </PlotFrame>
      <figcaption class="note">
        Centre line {chart.centreLine.toPrecision(3)}, limits {lowerLimit.toPrecision(3)} to {upperLimit.toPrecision(3)} (dashed); {flaggedCount} of {series.length} points break a run rule
        {drawn.binned ? `; ${series.length} points drawn as ${drawn.bins.length} bins (band: min to max, line: mean)` : ''}.
      </figcaption>
    </figure>
  );
}
