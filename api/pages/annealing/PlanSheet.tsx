import type { AnnealingPlan } from '../../../src/annealing/AnnealingPlan.ts';
import { OvenProfilePlot } from '../plots/OvenProfilePlot.tsx';

export interface PlanSheetProps {
  heading: string;
  /** Who the plan is for and whether it is a stored record or a draft. */
  standing: string;
  plan: AnnealingPlan;
}

/** A schedule to take to the oven: cautions first, then the programme, then its basis. */
export function PlanSheet({ heading, standing, plan }: PlanSheetProps) {
  return (
    <article>
      <h1>{heading}</h1>
      <p class="lede">{standing}</p>
      <section class="caution" aria-labelledby="h-cautions">
        <h2 id="h-cautions">Cautions</h2>
        <ul>{plan.cautions.map((c) => <li>{c}</li>)}</ul>
      </section>
      <dl class="facts">
        <dt>Guidance</dt><dd>{plan.guidanceTitle} ({plan.guidanceKey}{plan.catalogueVersion ? `, catalogue ${plan.catalogueVersion}` : ''})</dd>
        <dt>Thickest section</dt><dd>{plan.maxSectionThicknessMm} mm (half-thickness {plan.halfThicknessMm} mm)</dd>
        <dt>Start, highest</dt><dd>{plan.startTemperatureC} °C, {plan.maxTemperatureC} °C</dd>
        <dt>Total</dt><dd>{plan.totalDurationH.toFixed(2)} h</dd>
      </dl>
      {plan.preSteps.length > 0 && (
        <>
          <h2>Before the cycle</h2>
          <ul>{plan.preSteps.map((p) => <li>{p.kind}: {p.temperatureC} °C for {p.durationH} h. {p.note}</li>)}</ul>
        </>
      )}
      <h2>Oven programme</h2>
      <div class="table-wrap">
        <table>
          <thead><tr><th class="num">#</th><th>Step</th><th class="num">From, °C</th><th class="num">To, °C</th><th class="num">Rate, °C/h</th><th class="num">Duration, h</th><th class="num">Starts at, h</th></tr></thead>
          <tbody>
            {plan.segments.map((s) => (
              <tr>
                <td class="num">{s.number}</td><td>{s.kind}: {s.label}</td><td class="num">{s.startTemperatureC}</td><td class="num">{s.endTemperatureC}</td>
                <td class="num">{s.rateCPerH ?? 'hold'}</td><td class="num">{s.durationH.toFixed(2)}</td><td class="num">{s.startH.toFixed(2)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <OvenProfilePlot segments={plan.segments} samples={[]} title="Planned temperature profile" />
      {plan.warnings.length > 0 && (
        <>
          <h2>Warnings</h2>
          <ul>{plan.warnings.map((w) => <li>{w.message}</li>)}</ul>
        </>
      )}
      <h2>Basis</h2>
      <ul class="notes">{plan.notes.map((n) => <li>{n}</li>)}</ul>
      <ul class="notes">{plan.sources.map((s) => <li>{s.document}, {s.locator} [{s.flag}]</li>)}</ul>
      <p class="note">Defer to the lab's own safety rules, local codes and licensed practice.</p>
    </article>
  );
}
