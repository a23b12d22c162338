import { ColourSwatches } from './ColourSwatches.tsx';
import type { FormValues } from './readingFromForm.ts';

export const METHODS = [
  ['tardy', 'Tardy'],
  ['senarmont', 'Sénarmont'],
  ['whole_order', 'Whole order'],
  ['compensator', 'Compensator'],
  ['direct', 'Direct'],
  ['white_light_colour', 'White-light colour'],
] as const;

function NumberField({ name, label, hint, values, step = 'any' }: { name: string; label: string; hint?: string; values: FormValues; step?: string }) {
  return (
    <label class="field">
      {label}
      <input type="number" name={name} value={values[name] ?? ''} step={step} inputmode="decimal" />
      {hint && <span class="hint">{hint}</span>}
    </label>
  );
}

/**
 * Each method's raw inputs in its own block. The stylesheet shows only the chosen method's
 * block (CSS :has); a browser without it shows them all, and only the chosen one is read.
 */
export function MethodInputs({ values }: { values: FormValues }) {
  return (
    <>
      <div class="method-inputs inputs-tardy">
        <div class="fields">
          <NumberField name="tardyLowerOrder" label="Whole order below, n" values={values} step="1" />
          <NumberField name="tardyRotationDeg" label="Analyzer rotation β, degrees" hint="0 to 180" values={values} />
        </div>
        <div class="choices" role="radiogroup" aria-label="Fringe moved to the point">
          <label><input type="radio" name="tardyMoved" value="lower" checked={values.tardyMoved !== 'upper'} /> fringe n moved (N = n + β/180)</label>
          <label><input type="radio" name="tardyMoved" value="upper" checked={values.tardyMoved === 'upper'} /> fringe n + 1 moved (N = n + 1 − β/180)</label>
        </div>
      </div>
      <div class="method-inputs inputs-senarmont fields">
        <NumberField name="senarmontOrder" label="Whole order, n" values={values} step="1" />
        <NumberField name="senarmontRotationDeg" label="Analyzer rotation β, degrees" values={values} />
      </div>
      <div class="method-inputs inputs-whole_order fields">
        <NumberField name="wholeOrder" label="Whole fringe order at the point" values={values} step="1" />
      </div>
      <div class="method-inputs inputs-compensator fields">
        <NumberField name="compensatorNm" label="Compensator retardation, nm" values={values} />
      </div>
      <div class="method-inputs inputs-direct fields">
        <NumberField name="directOrder" label="Fringe order read directly" values={values} />
      </div>
      <div class="method-inputs inputs-white_light_colour">
        <ColourSwatches values={values} />
      </div>
    </>
  );
}
