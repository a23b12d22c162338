import { TREND_STAGES } from '../../../db/inputs/trends.ts';
import { BatchBoxPlot } from '../plots/BatchBoxPlot.tsx';
import { ControlChartPlot } from '../plots/ControlChartPlot.tsx';
import { EdgeAgingPlot } from '../plots/EdgeAgingPlot.tsx';
import { formatInstant } from '../shell/formatInstant.ts';
import { Layout } from '../shell/Layout.tsx';
import { STAGE_WORDING } from '../shell/stageWording.ts';
import type { TrendsData } from './loadTrends.ts';

const STORED_SHOWN = 25;

/** Residuals across the lab: batches side by side, one batch over time, and edge aging. */
export function TrendsPage({ data }: { data: TrendsData }) {
  const { stage, summary, groups, batch, chart, aging, curve } = data;
  const link = (q: Record<string, string>) => `/lab/trends?${new URLSearchParams({ stage, ...(batch ? { batch } : {}), ...q }).toString()}`;
  return (
    <Layout title="Trends">
      <h1>Residual trends</h1>
      <p class="lede">{summary.readingCount} current readings on {summary.modelCount} models at stage {STAGE_WORDING[stage]}; orders expressed at 577 nm.</p>
      <p class="choices" aria-label="Stage">{TREND_STAGES.map((s) => <a class={s === stage ? 'chip chip-on' : 'chip'} href={link({ stage: s })}>{STAGE_WORDING[s]}</a>)}</p>
      <h2 id="batches">Batches compared</h2>
      <BatchBoxPlot groups={groups} limit={summary.limit.fringeOrder} unit="Fringe order at 577 nm" title={`Residual fringe order per batch, ${STAGE_WORDING[stage]}`} />
      <p class="note">Limit: {summary.limit.source}.</p>
      <h2 id="batch-chart">One batch over time</h2>
      {groups.length > 0 && <p class="choices" aria-label="Batch">{groups.map((g) => <a class={g.key === batch ? 'chip chip-on' : 'chip'} href={`${link({ batch: g.key })}#batch-chart`}>{g.key}</a>)}</p>}
      {chart ? (
        <ControlChartPlot chart={chart.chart} unit={chart.unit} title={`Individuals chart of batch ${batch}: one point per model, by ${chart.axis}`} xLabel={`${chart.axis[0]!.toUpperCase()}${chart.axis.slice(1)} (UTC)`} />
      ) : (
        <p class="note">No batch has readings at this stage.</p>
      )}
      <h2 id="edge-aging">Edge aging in storage</h2>
      {curve ? (
        <EdgeAgingPlot curve={curve} limitOrder={aging.limit.fringeOrder} models={aging.storedModels} title="Machined-edge residual against storage time, with the forecast crossing of the limit" />
      ) : (
        <p class="note">No fit: {aging.fit.defined ? '' : aging.fit.reason}.</p>
      )}
      {aging.warnings.map((w) => <p class="caution">{w}</p>)}
      {aging.storedModels.length > 0 && (
        <div class="table-wrap">
          <table>
            <thead><tr><th>Stored model</th><th>Status</th><th>Test before</th><th class="num">Hours since machining</th><th class="num">Latest order</th></tr></thead>
            <tbody>
              {aging.storedModels.slice(0, STORED_SHOWN).map((s) => (
                <tr>
                  <td><a href={`/lab/models/${s.modelId}`}>{s.modelCode}</a></td>
                  <td>{s.status.replace('_', ' ')}</td>
                  <td>{formatInstant(s.testBeforeAt)}</td>
                  <td class="num">{s.hoursSinceMachining.toFixed(0)}</td>
                  <td class="num">{s.latestOrder === null ? '—' : s.latestOrder.toFixed(3)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
      <ul class="notes">{aging.notes.map((n) => <li>{n}</li>)}</ul>
    </Layout>
  );
}
