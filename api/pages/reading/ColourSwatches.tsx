import { colourScale } from '../../../src/colour/colourScale.ts';
import { isochromaticNamedSequence } from '../../../src/colour/isochromaticNamedSequence.ts';

// 20 nm steps to three fringes: about 90 swatches, fine enough that neighbours look alike.
const SCALE_FRINGES = 3;
const STEP_NM = 20;
const SCALE = colourScale(SCALE_FRINGES, STEP_NM, 'D65');
const NAMES = [...new Set(isochromaticNamedSequence.map((n) => n.name))];

/**
 * The computed dark-field colour scale as radio buttons drawn as swatches: a plain form
 * control, so the pick works by keyboard (arrow keys move along the scale) and without script.
 */
export function ColourSwatches({ values }: { values: Record<string, string> }) {
  return (
    <>
      <fieldset>
        <legend>Match the colour at the site (D65 daylight lamp, dark field)</legend>
        <div class="swatches" role="radiogroup">
          {SCALE.map((s) => (
            <label class="swatch" title={`${s.retardationNm} nm, N = ${s.fringeOrderAt577.toFixed(2)} at 577 nm`}>
              <input type="radio" name="colourPick" value={String(s.retardationNm)} checked={values.colourPick === String(s.retardationNm)} aria-label={`${s.retardationNm} nanometres, order ${s.fringeOrderAt577.toFixed(2)}`} />
              <svg viewBox="0 0 10 10" preserveAspectRatio="none" aria-hidden="true"><rect width="10" height="10" fill={s.hex} /></svg>
              <span>{s.fringeOrderAt577.toFixed(2)}</span>
            </label>
          ))}
        </div>
        <p class="note">Numbers: fringe order at 577 nm of each swatch. Screens differ; where a calibrated photo is at hand, enter its colour below instead.</p>
      </fieldset>
      <div class="fields">
        <label class="field">Or the colour from a photo (sRGB hex)
          <input type="text" name="colourHex" value={values.colourHex ?? ''} placeholder="#a1b2c3" maxlength={7} />
        </label>
        <label class="field">Or its name in the sequence
          <select name="colourName">
            <option value="">—</option>
            {NAMES.map((n) => <option value={n} selected={values.colourName === n}>{n}</option>)}
          </select>
        </label>
        <label class="field">Polariscope lamp
          <select name="illuminant">
            <option value="D65" selected={!values.illuminant || values.illuminant === 'D65'}>daylight (D65)</option>
            <option value="A" selected={values.illuminant === 'A'}>incandescent (A)</option>
            <option value="E" selected={values.illuminant === 'E'}>equal energy (E)</option>
          </select>
        </label>
      </div>
    </>
  );
}
