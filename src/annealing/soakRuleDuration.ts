import type { SoakTimeRule, SourceRef } from './AnnealingGuidance.ts';

/**
 * Soak time a guidance rule gives for a section: max(minimum, hours per mm × thickness).
 * A practice band's upper end is reported, not enforced; the plan decides what to do with it.
 *
 * @example
 * soakRuleDuration({ hoursPerMm: { value: 1, source: S }, minimumH: { value: 2, source: S } }, 12);
 * // { durationH: 12, maximumH: null, sources: [S, S] }
 */
export function soakRuleDuration(
  rule: SoakTimeRule,
  thicknessMm: number,
): { durationH: number; maximumH: number | null; sources: SourceRef[] } {
  const sources = [rule.minimumH.source];
  let durationH = rule.minimumH.value;
  if (rule.hoursPerMm !== undefined) {
    sources.push(rule.hoursPerMm.source);
    durationH = Math.max(durationH, rule.hoursPerMm.value * thicknessMm);
  }
  if (rule.maximumH !== undefined) sources.push(rule.maximumH.source);
  return { durationH, maximumH: rule.maximumH?.value ?? null, sources };
}
