import type { CriterionResult } from '../../../src/acceptance/FitnessTypes.ts';
import type { SiteResidualAssessment } from '../../../src/acceptance/assessSiteResidual.ts';
import type { OrderQuantity, StageName } from '../../../src/residual/SiteStagesTypes.ts';
import { DecisionBadge } from '../shell/DecisionBadge.tsx';
import { formatInstant } from '../shell/formatInstant.ts';
import { formatMeasured } from '../shell/formatMeasured.ts';
import { STAGE_WORDING } from '../shell/stageWording.ts';
import { ratioText } from './RatioText.ts';

type SiteResult = SiteResidualAssessment & { label: string; onFreeEdge: boolean };

const STAGE_ROWS: [StageName, string][] = [
  ['fabrication', 'Before load (fabrication)'],
  ['underLoad', 'Under load'],
  ['afterUnload', 'After unloading'],
  ['beforeAnneal', 'Before anneal'],
  ['afterAnneal', 'After anneal'],
];

const CRITERION_WORDING = { maxResidualFringeOrder: 'Residual fringe order', maxResidualStressMPa: 'Residual stress, MPa', maxResidualFractionOfTestOrder: 'Share of the test fringe order' } as const;

function QuantityRow({ name, q }: { name: string; q: OrderQuantity | undefined }) {
  if (!q) return null;
  return (
    <tr>
      <td>{name}</td>
      <td class="num">{formatMeasured(q.order)}</td>
      <td class="num">{formatMeasured(q.stress.stressMPa)}</td>
      <td class="note">{q.stagesWithAssumedSign.length > 0 ? `sign assumed positive: ${q.stagesWithAssumedSign.join(', ')}` : ''}</td>
    </tr>
  );
}

function CriterionLine({ c }: { c: CriterionResult }) {
  if (!c.evaluated) return <li>{CRITERION_WORDING[c.criterion]} ≤ {c.limit}: not judged ({c.reason})</li>;
  const g = c.guardBand;
  return (
    <li>
      {CRITERION_WORDING[c.criterion]}: {formatMeasured(c.judged)} against ≤ {c.limit}; U = {g.expandedUncertainty.toPrecision(2)} (k = {g.coverageFactor}), proven fit at or below {g.acceptanceZoneUpperBound.toPrecision(3)},
      proven over above {g.rejectionZoneLowerBound.toPrecision(3)}: <strong>{g.decision.replace('_', ' ')}</strong>
    </li>
  );
}

/** One site's analysis: what it carries now, every stage quantity, and how the decision fell. */
export function SiteAnalysisCard({ site, n, wavelengthNm }: { site: SiteResult; n: number; wavelengthNm: number }) {
  const a = site.analysis;
  const share = a?.permanentSetShare;
  return (
    <section class="card" aria-label={`Site ${n}: ${site.label}`}>
      <h3>{n}. {site.label} <DecisionBadge decision={site.decision} /></h3>
      {site.current ? (
        <p>
          Carries now ({STAGE_WORDING[site.current.stage]}, {formatInstant(site.current.observedAt)}): <strong>{formatMeasured(site.current.order, 'fringe')}</strong> at {wavelengthNm} nm,{' '}
          <strong>{formatMeasured(site.current.stress.stressMPa, 'MPa')}</strong> {site.current.stress.kind === 'edge_stress' ? 'edge stress' : 'principal stress difference'}
        </p>
      ) : (
        <p class="note">No reading without load at this site yet.</p>
      )}
      {a && (
        <div class="table-wrap">
          <table>
            <thead><tr><th>Quantity</th><th class="num">Fringe order ± u</th><th class="num">Stress ± u, MPa</th><th>Sign</th></tr></thead>
            <tbody>
              {STAGE_ROWS.map(([stage, name]) => <QuantityRow name={name} q={a.stages[stage]} />)}
              <QuantityRow name="Load-corrected (under load − fabrication)" q={a.loadCorrected} />
              <QuantityRow name="Permanent set (after unloading − fabrication)" q={a.permanentSet} />
            </tbody>
          </table>
        </div>
      )}
      <dl class="facts">
        {share && <><dt>Permanent-set share</dt><dd>{ratioText(share)}{share.possibleRelaxationOrSignReversal ? ' (flag: the unsigned order fell after loading: relaxation or a sign reversal)' : ''}</dd></>}
        {a?.inelasticFractionOfPeak && <><dt>Inelastic fraction of the peak</dt><dd>{ratioText(a.inelasticFractionOfPeak)}</dd></>}
        {a?.annealRelief && <><dt>Anneal relief</dt><dd>{ratioText(a.annealRelief)}</dd></>}
        {site.stressConcentration.measured?.defined && <><dt>Measured Kt</dt><dd>{formatMeasured(site.stressConcentration.measured.kt)}</dd></>}
        {site.stressConcentration.handbook.available && <><dt>Handbook Kt</dt><dd>{site.stressConcentration.handbook.ktNetSection.toFixed(2)} (net section)</dd></>}
      </dl>
      {site.fitness && (
        <>
          <h4>Decision against the limits</h4>
          <ul>{site.fitness.criteria.map((c) => <CriterionLine c={c} />)}</ul>
        </>
      )}
      {site.notes.length + (a?.notes.length ?? 0) > 0 && <ul class="notes">{[...site.notes, ...(a?.notes ?? [])].map((t) => <li>{t}</li>)}</ul>}
    </section>
  );
}
