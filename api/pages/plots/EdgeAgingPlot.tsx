import { scaleLinear } from 'd3-scale';
import { line } from 'd3-shape';
import { PLOT_MARGINS, PLOT_SIZE, PlotFrame } from './PlotFrame.tsx';

export interface EdgeAgingCurve {
  timeScale: 'sqrtTime' | 'linearTime';
  interceptOrder: number;
  slope: number;
  /** Hours since machining at which the curve reaches the limit, with its 95 % band. */
  testBeforeH: number | null;
  bandH: { lowerH: number; upperH: number | null } | null;
}

export interface AgedModel {
  modelCode: string;
  hoursSinceMachining: number;
  latestOrder: number | null;
}

const SAMPLES = 120;

/**
 * The time-edge fit N = a + b·√t (or a + b·t) drawn as a curve out past its forecast, the
 * limit, the forecast crossing with its 95 % band, and each stored model at its age.
 */
export function EdgeAgingPlot({ curve, limitOrder, models, title }: { curve: EdgeAgingCurve; limitOrder: number; models: AgedModel[]; title: string }) {
  const { width, height } = PLOT_SIZE;
  const m = PLOT_MARGINS;
  const placed = models.filter((s): s is AgedModel & { latestOrder: number } => s.latestOrder !== null).slice(0, 300);
  const maxH = Math.max(24, ...placed.map((s) => s.hoursSinceMachining), (curve.bandH?.upperH ?? curve.testBeforeH ?? 0) * 1.1);
  const at = (h: number) => curve.interceptOrder + curve.slope * (curve.timeScale === 'sqrtTime' ? Math.sqrt(h) : h);
  const samples = Array.from({ length: SAMPLES + 1 }, (_, i) => (maxH * i) / SAMPLES);
  const x = scaleLinear().domain([0, maxH]).nice().range([m.left, width - m.right]);
  const values = [...samples.map(at), limitOrder, ...placed.map((s) => s.latestOrder)];
  const y = scaleLinear().domain([Math.min(0, ...values), Math.max(...values) * 1.05]).nice().range([height - m.bottom, m.top]);
  const path = line<number>().x((h) => x(h)).y((h) => y(at(h)));
  const band = curve.bandH && [x(curve.bandH.lowerH), x(curve.bandH.upperH ?? maxH)];
  return (
    <figure>
      <PlotFrame title={title} x={x} y={y} xLabel="Hours since machining" yLabel="Edge fringe order at 577 nm" formatX={(h) => String(h)}>
        {band && <rect class="band" x={band[0]} width={Math.max(1, band[1]! - band[0]!)} y={m.top} height={height - m.top - m.bottom} />}
        <line class="limit" x1={m.left} x2={width - m.right} y1={y(limitOrder)} y2={y(limitOrder)} />
        <path class="series" d={path(samples) ?? ''} />
        {curve.testBeforeH !== null && <line class="centre" x1={x(curve.testBeforeH)} x2={x(curve.testBeforeH)} y1={m.top} y2={height - m.bottom} />}
        {placed.map((s) => (
          <circle class={s.latestOrder > limitOrder ? 'flagged' : 'point'} cx={x(s.hoursSinceMachining)} cy={y(s.latestOrder)} r="4">
            <title>{`${s.modelCode}: ${s.latestOrder.toFixed(3)} at ${s.hoursSinceMachining.toFixed(0)} h`}</title>
          </circle>
        ))}
      </PlotFrame>
      <figcaption class="note">
        Curve: N = {curve.interceptOrder.toPrecision(3)} + {curve.slope.toPrecision(3)}·{curve.timeScale === 'sqrtTime' ? '√t' : 't'}; dashed: limit {limitOrder};
        {curve.testBeforeH !== null ? ` vertical line: forecast crossing at ${curve.testBeforeH.toFixed(0)} h, shaded: its 95 % band` : ' the curve does not reach the limit'}; dots: stored models at their latest reading.
      </figcaption>
    </figure>
  );
}
