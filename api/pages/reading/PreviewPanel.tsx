import { formatMeasured } from '../shell/formatMeasured.ts';
import type { ReadingPreview } from './previewReading.ts';

/** The derived order before saving; for a colour, every order it could be, best match first. */
export function PreviewPanel({ preview }: { preview: ReadingPreview }) {
  const c = preview.colour;
  return (
    <section class="preview" aria-live="polite" aria-label="Preview">
      <p>Fringe order at {preview.wavelengthNm} nm</p>
      <p class="big">N = {formatMeasured(preview.fringeOrder)}</p>
      <p>Retardation δ = {formatMeasured(preview.retardationNm, 'nm')}</p>
      <p class="note">{preview.formula}</p>
      {c && (
        <>
          {c.ambiguous ? <p class="caution" role="alert"><strong>Ambiguous colour:</strong> {c.ambiguityReason}. Count fringes from a known black fringe to tell which order it is.</p> : <p class="note">No other order matches this colour within the discrimination threshold.</p>}
          <table>
            <thead><tr><th>Colour</th><th class="num">N ± u</th><th class="num">δ, nm</th><th class="num">ΔE00</th></tr></thead>
            <tbody>
              {c.candidates.map((k, i) => (
                <tr>
                  <td><svg width="36" height="20" viewBox="0 0 36 20" aria-hidden="true"><rect width="36" height="20" fill={k.hex} /></svg> {i === 0 ? 'best' : ''} {k.name ?? ''}</td>
                  <td class="num">{formatMeasured(k.fringeOrder)}</td>
                  <td class="num">{k.retardationNm.toFixed(0)}</td>
                  <td class="num">{k.deltaE2000 === null ? 'named' : k.deltaE2000.toFixed(1)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </>
      )}
    </section>
  );
}
