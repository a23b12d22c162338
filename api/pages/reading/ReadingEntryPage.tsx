import { READING_STAGES } from '../../../db/inputs/readings.ts';
import { Layout } from '../shell/Layout.tsx';
import { STAGE_WORDING } from '../shell/stageWording.ts';
import { METHODS, MethodInputs } from './MethodInputs.tsx';
import { PreviewPanel } from './PreviewPanel.tsx';
import type { ReadingPreview } from './previewReading.ts';
import type { FormValues } from './readingFromForm.ts';

export interface EntryPageProps {
  model: { id: string; code: string };
  sites: { id: string; label: string }[];
  values: FormValues;
  preview?: ReadingPreview | undefined;
  problems?: string[] | undefined;
}

function Radios({ name, options, checked, legend, focusFirst = false }: { name: string; options: readonly (readonly [string, string])[]; checked: string | undefined; legend: string; focusFirst?: boolean }) {
  return (
    <fieldset class={name === 'method' ? 'method-choice' : undefined}>
      <legend>{legend}</legend>
      <div class="choices">
        {options.map(([value, label], i) => (
          <label>
            <input type="radio" id={`${name}-${value}`} name={name} value={value} checked={checked === value} required autofocus={focusFirst && i === 0} />
            {label}
          </label>
        ))}
      </div>
    </fieldset>
  );
}

/** The bench form: site, stage, light, the method's raw inputs; preview first, then save. */
export function ReadingEntryPage({ model, sites, values, preview, problems }: EntryPageProps) {
  const v = values;
  return (
    <Layout title={`Reading on ${model.code}`}>
      <h1>Enter a reading on <a href={`/lab/models/${model.id}`}>{model.code}</a></h1>
      {problems && problems.length > 0 && (
        <div class="problem" role="alert"><strong>Not stored yet:</strong><ul>{problems.map((p) => <li>{p}</li>)}</ul></div>
      )}
      {preview && <PreviewPanel preview={preview} />}
      <form method="post" action={`/lab/models/${model.id}/readings`} class="entry">
        <Radios name="site" legend="Site" options={sites.map((s) => [s.id, s.label] as const)} checked={v.site ?? (sites.length === 1 ? sites[0]!.id : undefined)} focusFirst={!preview} />
        <Radios name="stage" legend="Stage" options={READING_STAGES.map((s) => [s, STAGE_WORDING[s]!] as const)} checked={v.stage} />
        <fieldset>
          <legend>Conditions</legend>
          <div class="fields">
            <label class="field">Observed at (UTC)<input type="datetime-local" name="observedAt" value={v.observedAt} required /></label>
            <label class="field">Operator<input type="text" name="operator" value={v.operator ?? ''} required maxlength={100} autocomplete="name" /></label>
            <label class="field">Load, N<input type="number" name="loadN" value={v.loadN ?? ''} step="any" inputmode="decimal" /><span class="hint">only for a reading under load</span></label>
            <label class="field">Wavelength, nm<input type="number" name="wavelengthNm" value={v.wavelengthNm ?? ''} step="any" inputmode="decimal" /><span class="hint">blank: white light (577 nm); colour readings are always white light</span></label>
            <label class="field">Reading uncertainty, fringes<input type="number" name="uncertaintyFringes" value={v.uncertaintyFringes ?? ''} step="any" inputmode="decimal" /><span class="hint">blank: the method's default</span></label>
          </div>
          <div class="choices" role="radiogroup" aria-label="Sign of the residual">
            {(['unknown', 'positive', 'negative'] as const).map((s) => (
              <label><input type="radio" name="sign" value={s} checked={(v.sign ?? 'unknown') === s} /> sign {s === 'positive' ? 'tension (+)' : s === 'negative' ? 'compression (−)' : 'not known'}</label>
            ))}
          </div>
        </fieldset>
        <Radios name="method" legend="Method" options={METHODS} checked={v.method} />
        <MethodInputs values={v} />
        <label class="field">Notes<textarea name="notes" rows={2} maxlength={2000}>{v.notes ?? ''}</textarea></label>
        <div class="actions">
          <button type="submit" name="action" value="preview" class={preview ? 'secondary' : 'primary'}>Preview the fringe order</button>
          {preview && <button type="submit" name="action" value="save" class="primary" autofocus>Save this reading</button>}
        </div>
      </form>
    </Layout>
  );
}
