/**
 * Rounds a computed rate down to what an oven controller can be keyed with (0.1 °C/h, or
 * 0.01 °C/h below 1 °C/h). Down, never up, so a rounded rate never exceeds its limit.
 *
 * @example
 * roundRateDownCPerH(10.333); // 10.3
 * roundRateDownCPerH(0.4567); // 0.45
 */
export function roundRateDownCPerH(rateCPerH: number): number {
  const step = rateCPerH >= 1 ? 10 : 100;
  // The small epsilon keeps exact values such as 4.9 from falling to 4.8 through binary error.
  return Math.floor(rateCPerH * step + 1e-9) / step;
}
