import { formatInstant } from '../shell/formatInstant.ts';
import type { AnnealingAdvice } from './loadAnnealingAdvice.ts';

/** The model's plans, and the cycle its guidance gives now when it is not yet fit to test. */
export function AnnealingSection({ modelId, advice }: { modelId: string; advice: AnnealingAdvice }) {
  const { current, plans, runs, draft, unavailable } = advice;
  return (
    <>
      {current ? (
        <p>
          Plan in force: <a href={`/lab/plans/${current.id}`}>{current.plan.guidanceTitle}</a>, {current.totalDurationH.toFixed(1)} h, up to {current.maxTemperatureC} °C
          <span class="note"> (made {formatInstant(current.createdAt)}; {plans.length} plan{plans.length === 1 ? '' : 's'} in all)</span>
        </p>
      ) : (
        <p class="note">No annealing plan stored for this model.</p>
      )}
      {runs.length > 0 && (
        <p>Oven runs: {runs.map((r, i) => <>{i > 0 ? ', ' : ''}<a href={`/lab/runs/${r.id}`}>{r.ovenName}, {formatInstant(r.startedAt)}</a></>)}</p>
      )}
      {draft && (
        <div class="card">
          <h3>Cycle the guidance gives now</h3>
          <p>
            {draft.entry.title}, chosen by {draft.chosenBy.replace('_', ' ')}, for {draft.thicknessMm} mm ({draft.thicknessSource === 'model' ? 'the model\'s thickness' : 'as given'}):
            {' '}{draft.plan.segments.length} segments, {draft.plan.totalDurationH.toFixed(1)} h in all, soak up to {draft.plan.maxTemperatureC} °C.
          </p>
          {draft.plan.warnings.length > 0 && <ul>{draft.plan.warnings.map((w) => <li>{w.message}</li>)}</ul>}
          <p><a class="button" href={`/lab/models/${modelId}/annealing-draft`}>Printable schedule with cautions</a></p>
        </div>
      )}
      {unavailable && <p class="note">No cycle can be drafted: {unavailable}</p>}
    </>
  );
}
