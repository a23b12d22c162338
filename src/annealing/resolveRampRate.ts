import type { RateRule, SourceRef } from './AnnealingGuidance.ts';
import type { PlanWarning } from './AnnealingPlan.ts';
import { SLAB_LAG } from './guidanceSources.ts';
import { maxRateForAllowedLag } from './maxRateForAllowedLag.ts';
import { roundRateDownCPerH } from './roundRateDownCPerH.ts';

export interface ResolvedRate {
  rateCPerH: number;
  sources: SourceRef[];
  notes: string[];
  warnings: Omit<PlanWarning, 'segmentNumber'>[];
}

/**
 * The ramp rate a guidance rule gives for one section thickness. Table gaps take the next
 * thicker (slower) row; beyond the last row the rate is extrapolated as 1/thickness².
 *
 * @example
 * resolveRampRate({ kind: 'inverse_square', constantCMm2PerH: { value: 12384, source: S } },
 *   { thicknessMm: 6, halfThicknessMm: 3, diffusivityMm2PerS: 0.43, allowedGradientC: 1 });
 * // { rateCPerH: 344, sources: [S], notes: [...], warnings: [] }
 */
export function resolveRampRate(
  rule: RateRule,
  section: { thicknessMm: number; halfThicknessMm: number; diffusivityMm2PerS: number; allowedGradientC: number },
): ResolvedRate {
  const t = section.thicknessMm;
  switch (rule.kind) {
    case 'fixed':
      return { rateCPerH: rule.rateCPerH.value, sources: [rule.rateCPerH.source], notes: [], warnings: [] };
    case 'inverse_square': {
      const rateCPerH = roundRateDownCPerH(rule.constantCMm2PerH.value / (t * t));
      return {
        rateCPerH,
        sources: [rule.constantCMm2PerH.source],
        notes: [`${rateCPerH} °C/h = ${rule.constantCMm2PerH.value.toFixed(0)} °C·mm²/h ÷ (${t} mm)², rounded down.`],
        warnings: [],
      };
    }
    case 'from_gradient': {
      const exact = maxRateForAllowedLag({
        allowedLagC: section.allowedGradientC,
        halfThicknessMm: section.halfThicknessMm,
        diffusivityMm2PerS: section.diffusivityMm2PerS,
      });
      const cap = rule.capCPerH;
      const capped = cap !== undefined && cap.value < exact;
      const rateCPerH = capped ? cap.value : roundRateDownCPerH(exact);
      const sources = cap !== undefined ? [SLAB_LAG, cap.source] : [SLAB_LAG];
      const note = capped
        ? `${rateCPerH} °C/h: the guidance cap, slower than the ${exact.toFixed(1)} °C/h the allowed gradient would permit.`
        : `${rateCPerH} °C/h: the fastest rate keeping the centre within ${section.allowedGradientC} °C of the surface, rounded down.`;
      const warnings: ResolvedRate['warnings'] =
        cap === undefined
          ? [{
              kind: 'rate_limited_only_by_gradient',
              message: `No rate is given for this ramp; ${rateCPerH} °C/h comes from the gradient limit alone. Check it against the oven's and the material's limits.`,
              numbers: { rateCPerH },
            }]
          : [];
      return { rateCPerH, sources, notes: [note], warnings };
    }
    case 'thickness_table': {
      const rows = rule.rows;
      const row = rows.find((r) => t <= r.maxThicknessMm);
      if (row === undefined) {
        const last = rows[rows.length - 1]!;
        const rateCPerH = roundRateDownCPerH(last.rateCPerH * (last.maxThicknessMm / t) ** 2);
        return {
          rateCPerH,
          sources: [rule.source, SLAB_LAG],
          notes: [],
          warnings: [{
            kind: 'beyond_table',
            message: `${t} mm is thicker than the table's last row (${last.maxThicknessMm} mm); ${rateCPerH} °C/h is extrapolated as 1/thickness² from it. Confirm with the material maker.`,
            numbers: { thicknessMm: t, lastRowThicknessMm: last.maxThicknessMm, rateCPerH },
          }],
        };
      }
      const notes: string[] = [];
      if (t < row.minThicknessMm) {
        notes.push(
          row === rows[0]
            ? `${t} mm is thinner than the table's first row; its rate (${row.rateCPerH} °C/h) is used.`
            : `${t} mm falls between table rows; the next thicker row (${row.minThicknessMm}–${row.maxThicknessMm} mm, ${row.rateCPerH} °C/h) is used, the slower choice.`,
        );
      }
      return { rateCPerH: row.rateCPerH, sources: [rule.source], notes, warnings: [] };
    }
  }
}
