import { TREND_STAGES } from '../../../db/inputs/trends.ts';
import { ControlChartPlot } from '../plots/ControlChartPlot.tsx';
import { DecisionBadge } from '../shell/DecisionBadge.tsx';
import { formatMeasured } from '../shell/formatMeasured.ts';
import { Layout } from '../shell/Layout.tsx';
import { STAGE_WORDING } from '../shell/stageWording.ts';
import { AnnealingSection } from './AnnealingSection.tsx';
import type { ModelPageData } from './loadModelPage.ts';
import { ModelSketch } from './ModelSketch.tsx';
import { ReadingsSection } from './ReadingsSection.tsx';
import { SiteAnalysisCard } from './SiteAnalysisCard.tsx';
import { TimelineSection } from './TimelineSection.tsx';

const LIMIT_SOURCE = { common_practice: 'common-practice limits (no limits set for this model or its project)', model: 'limits set for this model', project: 'limits set for its project' } as const;

/** A model: its sites on a sketch, the residual analysis and decision, annealing, readings, history. */
export function ModelPage({ data, canWrite, flash }: { data: ModelPageData; canWrite: boolean; flash?: string | undefined }) {
  const { detail, analysis, chart, chartStage } = data;
  const { model, material, batch } = detail;
  const fv = analysis.fringeValue;
  const criteria = Object.entries(analysis.limits.criteria).map(([k, v]) => `${k.replace('maxResidual', '').replace(/([A-Z])/g, ' $1').trim().toLowerCase()} ≤ ${v}`);
  return (
    <Layout title={`Model ${model.code}`}>
      <h1>Model {model.code} <DecisionBadge decision={analysis.decision} /></h1>
      <p class="lede">{material.name}, batch {batch.code}; {model.geometryKind.replaceAll('_', ' ')}, {formatMeasured({ value: model.thicknessMm, uncertainty: model.thicknessUncertaintyMm }, 'mm')} thick{model.project ? `; project ${model.project}` : ''}</p>
      {flash && <p class="flash" role="status">{flash}</p>}
      {canWrite && detail.sites.length > 0 && <p class="no-print"><a class="button" href={`/lab/models/${model.id}/readings/new`}>Enter a reading</a></p>}
      <div class="grid">
        <section>
          <h2>Sites</h2>
          <ModelSketch geometryKind={model.geometryKind} sites={analysis.sites.map((s) => ({ label: s.label, kind: s.kind, decision: s.decision }))} />
          <ol>{analysis.sites.map((s) => <li>{s.label} <DecisionBadge decision={s.decision} /></li>)}</ol>
        </section>
        <section>
          <h2>Basis of the decision</h2>
          <dl class="facts">
            <dt>Fringe value</dt><dd>{formatMeasured(fv.fringeValueNPerMm, 'N/mm per fringe')} at {fv.wavelengthNm} nm ({fv.source === 'batch_calibration' ? `${fv.calibrationCount} calibration${fv.calibrationCount === 1 ? '' : 's'} of this batch` : 'catalogue value'})</dd>
            <dt>Limits</dt><dd>{criteria.join('; ') || 'none'}, k = {analysis.limits.coverageFactor}: {LIMIT_SOURCE[analysis.limits.source]}{analysis.limits.flag ? ` ${analysis.limits.flag}` : ''}</dd>
            <dt>Decision rule</dt><dd>fit only when the value plus U is within the limit, over only when the value minus U is beyond it; the model takes its worst site's decision</dd>
          </dl>
        </section>
      </div>
      <h2>Residual analysis</h2>
      {analysis.sites.length === 0 ? <p class="note">No sites yet.</p> : analysis.sites.map((s, i) => <SiteAnalysisCard site={s} n={i + 1} wavelengthNm={fv.wavelengthNm} />)}
      <ul class="notes">{analysis.notes.map((n) => <li>{n}</li>)}</ul>
      <h2>Annealing</h2>
      <AnnealingSection modelId={model.id} advice={data.advice} />
      <h2 id="readings">Readings</h2>
      <ReadingsSection data={data} />
      <h2 id="chart">Control chart</h2>
      <p class="choices no-print" aria-label="Stage of the chart">
        {TREND_STAGES.map((st) => <a class={st === chartStage ? 'chip chip-on' : 'chip'} href={`/lab/models/${model.id}?chartStage=${st}#chart`}>{STAGE_WORDING[st]}</a>)}
      </p>
      <ControlChartPlot chart={chart.chart} unit={chart.unit} title={`Individuals chart of ${model.code}, ${STAGE_WORDING[chartStage]}, ${chart.readingCount} readings`} />
      <h2>History</h2>
      <TimelineSection data={data} />
    </Layout>
  );
}
