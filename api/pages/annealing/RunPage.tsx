import type { RunView } from '../../../db/operations/annealing/getRun.ts';
import type { AnnealingPlan } from '../../../src/annealing/AnnealingPlan.ts';
import { OvenProfilePlot, type LoggedSample } from '../plots/OvenProfilePlot.tsx';
import { formatInstant } from '../shell/formatInstant.ts';
import { Layout } from '../shell/Layout.tsx';

const VERDICT = { pass: 'passed', pass_with_remarks: 'passed with remarks', fail: 'failed' } as Record<string, string>;

/** An oven run: its load, the plan against what the oven logged, and the comparison's verdict. */
export function RunPage({ run, plan, samples }: { run: RunView; plan: AnnealingPlan; samples: LoggedSample[] }) {
  return (
    <Layout title={`Oven run ${run.ovenName}`}>
      <h1>Oven run in {run.ovenName}</h1>
      <p class="lede">Started {formatInstant(run.startedAt)} by {run.operator}; planned end {formatInstant(run.plannedEndAt)}. Load: {run.models.map((m) => m.code).join(', ') || 'none'}.</p>
      <p><a href={`/lab/plans/${run.plan.id}`}>Printable plan with cautions</a></p>
      <OvenProfilePlot segments={plan.segments} samples={samples} title={`Plan against oven log, ${run.ovenName}`} />
      {run.currentLog ? (
        <section class={run.currentLog.verdict === 'fail' ? 'problem' : 'card'}>
          <h2>Log comparison: {VERDICT[run.currentLog.verdict] ?? run.currentLog.verdict}</h2>
          <p class="note">{run.currentLog.sampleCount} samples imported {formatInstant(run.currentLog.importedAt)}.</p>
          <ul>{(run.currentLog.reasons ?? []).map((r) => <li>{r}</li>)}</ul>
        </section>
      ) : (
        <p class="note">No oven log imported for this run yet.</p>
      )}
      <section class="caution"><h2>Cautions</h2><ul>{run.cautions.map((c) => <li>{c}</li>)}</ul></section>
    </Layout>
  );
}
