import type { Child } from 'hono/jsx';

export interface Margins {
  top: number;
  right: number;
  bottom: number;
  left: number;
}

export const PLOT_SIZE = { width: 720, height: 300 };
export const PLOT_MARGINS: Margins = { top: 16, right: 20, bottom: 44, left: 64 };

/** The continuous scales a frame can draw axes for (d3-scale linear and time scales both fit). */
export interface AxisScale<T> {
  (value: T): number;
  ticks(count?: number): T[];
  range(): number[];
}

export interface PlotFrameProps<X> {
  title: string;
  x: AxisScale<X>;
  y: AxisScale<number>;
  xLabel: string;
  yLabel: string;
  formatX: (v: X) => string;
  formatY?: (v: number) => string;
  /** Ticks on the band axis of a category plot, drawn instead of the x scale's. */
  xCategories?: { label: string; at: number }[];
  children?: Child;
}

/**
 * An SVG plot with grid, axes and labels around whatever the children draw; the scales
 * decide where ticks go, so each plot only computes its own marks.
 */
export function PlotFrame<X>({ title, x, y, xLabel, yLabel, formatX, formatY = (v) => String(Number(v.toPrecision(4))), xCategories, children }: PlotFrameProps<X>) {
  const { width, height } = PLOT_SIZE;
  const m = PLOT_MARGINS;
  const xTicks = xCategories ?? x.ticks(6).map((t) => ({ label: formatX(t), at: x(t) }));
  const yTicks = y.ticks(5);
  return (
    <svg class="plot" viewBox={`0 0 ${width} ${height}`} role="img" aria-label={title}>
      <title>{title}</title>
      {yTicks.map((t) => <line class="gridline" x1={m.left} x2={width - m.right} y1={y(t)} y2={y(t)} />)}
      <g class="axis">
        <line x1={m.left} x2={width - m.right} y1={height - m.bottom} y2={height - m.bottom} />
        <line x1={m.left} x2={m.left} y1={m.top} y2={height - m.bottom} />
        {xTicks.map((t) => (
          <g>
            <line x1={t.at} x2={t.at} y1={height - m.bottom} y2={height - m.bottom + 5} />
            <text x={t.at} y={height - m.bottom + 18} text-anchor="middle">{t.label}</text>
          </g>
        ))}
        {yTicks.map((t) => (
          <g>
            <line x1={m.left - 5} x2={m.left} y1={y(t)} y2={y(t)} />
            <text x={m.left - 8} y={y(t) + 4} text-anchor="end">{formatY(t)}</text>
          </g>
        ))}
      </g>
      <text x={(m.left + width - m.right) / 2} y={height - 6} text-anchor="middle">{xLabel}</text>
      <text x={14} y={(m.top + height - m.bottom) / 2} text-anchor="middle" transform={`rotate(-90 14 ${(m.top + height - m.bottom) / 2})`}>{yLabel}</text>
      {children}
    </svg>
  );
}
