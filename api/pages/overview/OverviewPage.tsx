import { DecisionBadge } from '../shell/DecisionBadge.tsx';
import { formatInstant } from '../shell/formatInstant.ts';
import { formatMeasured } from '../shell/formatMeasured.ts';
import { Layout } from '../shell/Layout.tsx';
import { STAGE_WORDING } from '../shell/stageWording.ts';
import type { Overview, OverviewModel } from './loadOverview.ts';

const RUN_STATUS = { scheduled: 'Not started yet', in_oven: 'In the oven', awaiting_log: 'Cycle over, oven log not imported' } as const;

function ModelList({ models, empty }: { models: OverviewModel[]; empty: string }) {
  if (models.length === 0) return <p class="note">{empty}</p>;
  return (
    <ul>
      {models.map((m) => (
        <li>
          <a href={`/lab/models/${m.id}`}>{m.code}</a> <DecisionBadge decision={m.decision} />
          <span class="note"> {m.materialName}; {m.siteCount} site{m.siteCount === 1 ? '' : 's'}{m.sitesOver.length > 0 ? `; over the limit at ${m.sitesOver.join(', ')}` : ''}</span>
        </li>
      ))}
    </ul>
  );
}

/** The lab at a glance: what needs a decision, what needs the oven, what is in it. */
export function OverviewPage({ overview, flash }: { overview: Overview; flash?: string | undefined }) {
  const { models, awaiting, needAnnealing, fit, recent, runs, nextCursor } = overview;
  return (
    <Layout title="Lab overview">
      <h1>Lab overview</h1>
      <p class="lede">{models.length === 0 ? 'No models recorded yet. Add them through the API (POST /v1/models), then read their critical sites here.' : `${models.length} model${models.length === 1 ? '' : 's'} on this page, each judged on its latest reading without load at every site.`}</p>
      {flash && <p class="flash" role="status">{flash}</p>}
      <div class="grid">
        <section class="card" aria-labelledby="h-awaiting">
          <h2 id="h-awaiting">Awaiting a decision</h2>
          <ModelList models={awaiting} empty="Every model here has a decision." />
        </section>
        <section class="card" aria-labelledby="h-anneal">
          <h2 id="h-anneal">Anneal before testing</h2>
          <ModelList models={needAnnealing} empty="No model is over its residual limit." />
        </section>
        <section class="card" aria-labelledby="h-oven">
          <h2 id="h-oven">Oven</h2>
          {runs.length === 0 ? (
            <p class="note">No run in the oven or waiting for its log.</p>
          ) : (
            <ul>
              {runs.map((r) => (
                <li>
                  <a href={`/lab/runs/${r.id}`}>{r.ovenName}</a>: {RUN_STATUS[r.status]}
                  <span class="note"> {formatInstant(r.startedAt)} to {formatInstant(r.plannedEndAt)}; {r.modelCodes.join(', ') || 'no models'}</span>
                </li>
              ))}
            </ul>
          )}
        </section>
        <section class="card" aria-labelledby="h-fit">
          <h2 id="h-fit">Fit to test</h2>
          <ModelList models={fit} empty="None yet." />
        </section>
      </div>
      <h2>Latest readings the decisions rest on</h2>
      {recent.length === 0 ? (
        <p class="note">No readings yet.</p>
      ) : (
        <div class="table-wrap">
          <table>
            <thead><tr><th>Observed</th><th>Model</th><th>Site</th><th>Stage</th><th class="num">Fringe order</th><th>Site decision</th></tr></thead>
            <tbody>
              {recent.map((r) => (
                <tr>
                  <td>{formatInstant(r.observedAt)}</td>
                  <td><a href={`/lab/models/${r.modelId}`}>{r.modelCode}</a></td>
                  <td>{r.siteLabel}</td>
                  <td>{STAGE_WORDING[r.stage]}</td>
                  <td class="num">{formatMeasured(r.order)}</td>
                  <td><DecisionBadge decision={r.decision} /></td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
      {nextCursor && (
        <p class="pager"><a href={`/lab?cursor=${encodeURIComponent(nextCursor)}`}>Next models →</a></p>
      )}
    </Layout>
  );
}
