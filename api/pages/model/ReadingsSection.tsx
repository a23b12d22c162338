import { READING_STAGES } from '../../../db/inputs/readings.ts';
import { formatInstant } from '../shell/formatInstant.ts';
import { STAGE_WORDING } from '../shell/stageWording.ts';
import type { ModelPageData } from './loadModelPage.ts';

const METHOD_WORDING: Record<string, string> = { whole_order: 'whole order', tardy: 'Tardy', senarmont: 'Sénarmont', compensator: 'compensator', direct: 'direct', white_light_colour: 'white-light colour' };

/** One page of one site's current readings, with the site and stage to look at chosen by links. */
export function ReadingsSection({ data }: { data: ModelPageData }) {
  const { detail, site, stage, readings } = data;
  const base = `/lab/models/${detail.model.id}`;
  if (!site) return <p class="note">This model has no sites yet; add them through the API (POST /v1/models/{'{id}'}/sites).</p>;
  const link = (q: Record<string, string | undefined>) => {
    const params = new URLSearchParams(Object.entries({ site: site.id, stage, ...q }).filter((e): e is [string, string] => e[1] !== undefined));
    return `${base}?${params.toString()}#readings`;
  };
  return (
    <>
      <p class="choices" aria-label="Site">
        {detail.sites.map((s) => (s.id === site.id ? <strong class="chip chip-on">{s.label}</strong> : <a class="chip" href={`${base}?site=${s.id}#readings`}>{s.label}</a>))}
      </p>
      <p class="choices" aria-label="Stage">
        <a class={stage ? 'chip' : 'chip chip-on'} href={link({ stage: undefined, cursor: undefined })}>all stages</a>
        {READING_STAGES.map((st) => <a class={st === stage ? 'chip chip-on' : 'chip'} href={link({ stage: st, cursor: undefined })}>{STAGE_WORDING[st]}</a>)}
      </p>
      {readings.items.length === 0 ? (
        <p class="note">No current readings {stage ? `at stage ${STAGE_WORDING[stage]} ` : ''}at {site.label}.</p>
      ) : (
        <div class="table-wrap">
          <table>
            <thead><tr><th>Observed</th><th>Stage</th><th>Method</th><th class="num">N ± u</th><th class="num">λ, nm</th><th class="num">Load, N</th><th>Sign</th><th>Operator</th></tr></thead>
            <tbody>
              {readings.items.map((r) => (
                <tr>
                  <td>{formatInstant(r.observedAt)}</td>
                  <td>{STAGE_WORDING[r.stage]}</td>
                  <td>{METHOD_WORDING[r.method] ?? r.method}{r.supersedesId ? ' (amended)' : ''}</td>
                  <td class="num">{r.fringeOrder.toFixed(3)} ± {r.fringeOrderUncertainty.toFixed(3)}</td>
                  <td class="num">{r.wavelengthNm ?? 'white'}</td>
                  <td class="num">{r.loadN ?? ''}</td>
                  <td>{r.sign}</td>
                  <td>{r.operator}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
      <p class="pager">
        {data.readings.nextCursor && <a href={link({ cursor: data.readings.nextCursor })}>Later readings →</a>}
      </p>
    </>
  );
}
