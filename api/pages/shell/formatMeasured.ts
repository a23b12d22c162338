import type { Measured } from '../../../src/uncertainty/Measured.ts';

/** Decimal places that show the uncertainty to two significant digits (at most 6). */
function placesFor(uncertainty: number): number {
  if (!(uncertainty > 0) || !Number.isFinite(uncertainty)) return 3;
  return Math.min(6, Math.max(0, 1 - Math.floor(Math.log10(uncertainty))));
}

/**
 * A value with its standard uncertainty as the pages print it, the value rounded to the
 * uncertainty's second significant digit (common practice, GUM 7.2.6).
 *
 * @example
 * formatMeasured({ value: 0.10012, uncertainty: 0.0201 }, 'fringe'); // '0.100 ± 0.020 fringe'
 */
export function formatMeasured(m: Measured, unit = ''): string {
  const places = placesFor(m.uncertainty);
  const text = `${m.value.toFixed(places)} ± ${m.uncertainty.toFixed(places)}`;
  return unit ? `${text} ${unit}` : text;
}
