import { formatInstant } from '../shell/formatInstant.ts';
import type { ModelPageData } from './loadModelPage.ts';

// A model has tens of events, not thousands; beyond this the oldest are summarised.
const SHOWN = 60;

/** The fabrication history as a vertical timeline, newest last as it happened. */
export function TimelineSection({ data }: { data: ModelPageData }) {
  const events = data.detail.timeline;
  if (events.length === 0) return <p class="note">No history recorded yet.</p>;
  const hidden = Math.max(0, events.length - SHOWN);
  return (
    <>
      {hidden > 0 && <p class="note">{hidden} earlier events not shown.</p>}
      <ol class="timeline">
        {events.slice(hidden).map((e) => (
          <li>
            <strong>{e.kind}</strong> <span class="note">{formatInstant(e.occurredAt)}, {e.operator}</span>
            <div class="note">
              {[e.machiningMethod, e.tool, e.temperatureC !== null ? `${e.temperatureC} °C` : null, e.relativeHumidityPct !== null ? `${e.relativeHumidityPct} % RH` : null, e.loadN !== null ? `${e.loadN} N` : null, e.notes]
                .filter(Boolean)
                .join('; ')}
            </div>
          </li>
        ))}
      </ol>
    </>
  );
}
