import { CreateReadingInput } from '../../../db/inputs/readings.ts';

export type FormValues = Record<string, string>;

export type ParsedReadingForm =
  | { ok: true; siteId: string; input: CreateReadingInput }
  | { ok: false; siteId: string | undefined; problems: string[] };

const FIELD_WORDING: Record<string, string> = {
  stage: 'Stage', loadN: 'Load', observedAt: 'Observed at', operator: 'Operator', wavelengthNm: 'Wavelength', sign: 'Sign',
  uncertaintyFringes: 'Reading uncertainty', notes: 'Notes', reading: 'Reading', method: 'Method', lowerOrder: 'Whole order below',
  analyzerRotationDeg: 'Analyzer rotation', movedFringe: 'Fringe moved', wholeOrder: 'Whole order', retardationNm: 'Retardation',
  fringeOrder: 'Fringe order', srgbHex: 'Colour (hex)', namedColour: 'Colour name', illuminant: 'Lamp',
};

const text = (v: string | undefined) => (v === undefined || v.trim() === '' ? undefined : v.trim());
// Empty stays undefined so the schema can say "required"; anything else goes through as a number (NaN is refused there).
const number = (v: string | undefined) => (text(v) === undefined ? undefined : Number(v));

/** The method's raw inputs from the fields of its own part of the form. */
function methodInputs(f: FormValues): Record<string, unknown> {
  switch (f.method) {
    case 'tardy':
      return { method: 'tardy', lowerOrder: number(f.tardyLowerOrder), analyzerRotationDeg: number(f.tardyRotationDeg), movedFringe: text(f.tardyMoved) };
    case 'senarmont':
      return { method: 'senarmont', wholeOrder: number(f.senarmontOrder), analyzerRotationDeg: number(f.senarmontRotationDeg) };
    case 'whole_order':
      return { method: 'whole_order', wholeOrder: number(f.wholeOrder) };
    case 'compensator':
      return { method: 'compensator', retardationNm: number(f.compensatorNm) };
    case 'direct':
      return { method: 'direct', fringeOrder: number(f.directOrder) };
    case 'white_light_colour':
      // Every colour given is passed on, so two at once is refused by the schema rather than one silently winning.
      return { method: 'white_light_colour', srgbHex: text(f.colourHex), namedColour: text(f.colourName), retardationNm: number(f.colourPick), illuminant: text(f.illuminant) };
    default:
      return { method: text(f.method) };
  }
}

const dropUndefined = (o: Record<string, unknown>) => Object.fromEntries(Object.entries(o).filter(([, v]) => v !== undefined));

/**
 * The bench form as the API's reading input, validated by the same schema the API uses, so
 * a page can never store what the API would refuse. Times are entered in UTC.
 */
export function readingFromForm(f: FormValues): ParsedReadingForm {
  const siteId = text(f.site);
  const observed = text(f.observedAt);
  const colour = f.method === 'white_light_colour';
  const candidate = dropUndefined({
    stage: text(f.stage),
    loadN: f.stage === 'under_load' ? number(f.loadN) : undefined,
    observedAt: observed && /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}$/.test(observed) ? `${observed}:00Z` : observed,
    operator: text(f.operator),
    wavelengthNm: colour ? null : (number(f.wavelengthNm) ?? null),
    reading: dropUndefined(methodInputs(f)),
    sign: text(f.sign) ?? 'unknown',
    uncertaintyFringes: number(f.uncertaintyFringes),
    notes: text(f.notes),
  });
  const parsed = CreateReadingInput.safeParse(candidate);
  const problems = parsed.success ? [] : parsed.error.issues.map((i) => `${i.path.map((p) => FIELD_WORDING[String(p)] ?? String(p)).join(' › ') || 'Reading'}: ${i.message}`);
  if (!siteId) problems.unshift('Site: pick the site you read');
  if (problems.length > 0 || !parsed.success || !siteId) return { ok: false, siteId, problems };
  return { ok: true, siteId, input: parsed.data };
}
