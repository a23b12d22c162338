import { scaleLinear } from 'd3-scale';
import { line } from 'd3-shape';
import { binSeries } from './binSeries.ts';
import { PLOT_MARGINS, PLOT_SIZE, PlotFrame } from './PlotFrame.tsx';

export interface PlannedSegment {
  startH: number;
  durationH: number;
  startTemperatureC: number;
  endTemperatureC: number;
}

export interface LoggedSample {
  elapsedH: number;
  temperatureC: number;
}

/**
 * The planned cycle as a dashed profile and, when a log is there, the oven's own record over
 * it. Long logs are thinned to bin means (binSeries) so the SVG stays small.
 */
export function OvenProfilePlot({ segments, samples, title }: { segments: PlannedSegment[]; samples: LoggedSample[]; title: string }) {
  if (segments.length === 0) return <p class="note">{title}: the plan has no segments.</p>;
  const { width, height } = PLOT_SIZE;
  const m = PLOT_MARGINS;
  const planned = [{ h: segments[0]!.startH, t: segments[0]!.startTemperatureC }, ...segments.map((s) => ({ h: s.startH + s.durationH, t: s.endTemperatureC }))];
  const thinned = binSeries(samples.map((s) => ({ x: s.elapsedH, value: s.temperatureC, flagged: false })), 1500, 750, 0);
  const logged = thinned.binned ? thinned.bins.map((b) => ({ x: b.x, value: b.mean })) : thinned.points;
  const hs = [...planned.map((p) => p.h), ...logged.map((p) => p.x)];
  const ts = [...planned.map((p) => p.t), ...logged.map((p) => p.value)];
  const x = scaleLinear().domain([0, Math.max(...hs)]).nice().range([m.left, width - m.right]);
  const y = scaleLinear().domain([Math.min(...ts) - 5, Math.max(...ts) + 5]).nice().range([height - m.bottom, m.top]);
  const plannedPath = line<{ h: number; t: number }>().x((p) => x(p.h)).y((p) => y(p.t));
  const loggedPath = line<{ x: number; value: number }>().x((p) => x(p.x)).y((p) => y(p.value));
  return (
    <figure>
      <PlotFrame title={title} x={x} y={y} xLabel="Elapsed time, h" yLabel="Temperature, °C" formatX={(h) => String(h)}>
        <path class="planned" d={plannedPath(planned) ?? ''} />
        {logged.length > 1 && <path class="measured" d={loggedPath(logged) ?? ''} />}
      </PlotFrame>
      <figcaption class="note">Dashed: the plan; solid: the oven log{samples.length === 0 ? ' (none imported yet)' : `, ${samples.length} samples${thinned.binned ? ` drawn as ${thinned.bins.length} bin means` : ''}`}.</figcaption>
    </figure>
  );
}
