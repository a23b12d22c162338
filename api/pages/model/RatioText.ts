import type { Measured } from '../../../src/uncertainty/Measured.ts';
import { formatMeasured } from '../shell/formatMeasured.ts';

/**
 * A ratio the analysis may leave undefined, as words: its value as a percentage with u, or
 * the analysis's reason for not dividing.
 *
 * @example
 * ratioText({ defined: true, ratio: { value: 0.3333, uncertainty: 0.05 } }); // '33.3 ± 5.0 %'
 * ratioText({ defined: false, reason: 'both terms are within their uncertainty of zero' });
 * // 'undefined: both terms are within their uncertainty of zero'
 */
export function ratioText(r: { defined: true; ratio?: Measured; share?: Measured } | { defined: false; reason: string }): string {
  if (!r.defined) return `undefined: ${r.reason}`;
  const m = r.ratio ?? r.share!;
  return formatMeasured({ value: m.value * 100, uncertainty: m.uncertainty * 100 }, '%');
}
