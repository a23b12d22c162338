import { DomainError } from '../errors/DomainError.ts';
import type { FieldProblem } from '../errors/DomainError.ts';
import type { AnnealingGuidanceEntry } from './AnnealingGuidance.ts';

type Obj = Record<string, unknown>;

const FLAGS = ['read', 'from_memory', 'common_practice', 'derived'];
const FAMILIES = ['cast_acrylic', 'polycarbonate', 'epoxy_anhydride', 'soda_lime_glass', 'other'];
const REFERENCES = ['glass_transition', 'deflection_temperature', 'annealing_point', 'strain_point', 'softening_point'];
const KEY_PATTERN = /^[a-z0-9]+(?:-[a-z0-9]+)*(?:\.[a-z0-9]+(?:-[a-z0-9]+)*)+$/;

/**
 * Checks that unknown data (a catalogue entry or a lab's own) has the AnnealingGuidanceEntry
 * shape, with a source on every number, and returns it typed. All problems are collected
 * first, so a lab sees every bad field at once.
 *
 * @example
 * validateGuidanceEntry(CAST_ACRYLIC_GUIDANCE); // returns the entry unchanged
 * validateGuidanceEntry({ key: 'x' });
 * // throws DomainError('invalid_input') with problems such as
 * // { field: 'key', message: "must look like 'material.variant'" }, { field: 'title', ... }
 */
export function validateGuidanceEntry(entry: unknown): AnnealingGuidanceEntry {
  const problems: FieldProblem[] = [];
  const fail = (field: string, message: string): void => {
    problems.push({ field, message });
  };
  const isObj = (v: unknown): v is Obj => typeof v === 'object' && v !== null && !Array.isArray(v);
  const obj = (v: unknown, field: string): Obj | undefined => {
    if (isObj(v)) return v;
    fail(field, 'must be an object');
    return undefined;
  };
  const text = (v: unknown, field: string): void => {
    if (typeof v !== 'string' || v.trim() === '') fail(field, 'must be a non-empty string');
  };
  const num = (v: unknown, field: string, min = -Infinity, minExclusive = false): void => {
    if (typeof v !== 'number' || !Number.isFinite(v)) fail(field, 'must be a finite number');
    else if (minExclusive ? !(v > min) : v < min) fail(field, `must be ${minExclusive ? 'greater than' : 'at least'} ${min}`);
  };
  const source = (v: unknown, field: string): void => {
    const s = obj(v, field);
    if (!s) return;
    text(s.document, `${field}.document`);
    text(s.locator, `${field}.locator`);
    if (!FLAGS.includes(s.flag as string)) fail(`${field}.flag`, `must be one of ${FLAGS.join(', ')}`);
  };
  const sourced = (v: unknown, field: string, min = -Infinity, minExclusive = false): void => {
    const s = obj(v, field);
    if (!s) return;
    num(s.value, `${field}.value`, min, minExclusive);
    source(s.source, `${field}.source`);
    if (s.range === undefined) return;
    const r = s.range;
    if (!Array.isArray(r) || r.length !== 2 || !r.every((x) => typeof x === 'number' && Number.isFinite(x)) || r[0] > r[1]) {
      fail(`${field}.range`, 'must be [low, high] finite numbers with low ≤ high');
    } else if (typeof s.value === 'number' && (s.value < r[0] || s.value > r[1])) {
      fail(`${field}.value`, 'must lie inside its range');
    }
  };
  const list = (v: unknown, field: string, each: (item: unknown, f: string) => void, nonEmpty = true): void => {
    if (!Array.isArray(v)) return fail(field, 'must be an array');
    if (nonEmpty && v.length === 0) fail(field, 'must not be empty');
    v.forEach((item, i) => each(item, `${field}[${i}]`));
  };
  const target = (v: unknown, field: string): void => {
    const t = obj(v, field);
    if (!t) return;
    if (t.kind === 'absolute') sourced(t.temperatureC, `${field}.temperatureC`);
    else if (t.kind === 'relative') {
      if (!REFERENCES.includes(t.reference as string)) fail(`${field}.reference`, `must be one of ${REFERENCES.join(', ')}`);
      sourced(t.referenceTemperatureC, `${field}.referenceTemperatureC`);
      sourced(t.offsetC, `${field}.offsetC`);
    } else if (t.kind === 'start_temperature') source(t.source, `${field}.source`);
    else fail(`${field}.kind`, "must be 'absolute', 'relative' or 'start_temperature'");
  };
  const rate = (v: unknown, field: string): void => {
    const r = obj(v, field);
    if (!r) return;
    if (r.kind === 'fixed') sourced(r.rateCPerH, `${field}.rateCPerH`, 0, true);
    else if (r.kind === 'inverse_square') sourced(r.constantCMm2PerH, `${field}.constantCMm2PerH`, 0, true);
    else if (r.kind === 'from_gradient') {
      if (r.capCPerH !== undefined) sourced(r.capCPerH, `${field}.capCPerH`, 0, true);
    } else if (r.kind === 'thickness_table') {
      source(r.source, `${field}.source`);
      let previousMax = -Infinity;
      list(r.rows, `${field}.rows`, (row, f) => {
        const o = obj(row, f);
        if (!o) return;
        num(o.minThicknessMm, `${f}.minThicknessMm`, 0, true);
        num(o.maxThicknessMm, `${f}.maxThicknessMm`, 0, true);
        num(o.rateCPerH, `${f}.rateCPerH`, 0, true);
        const lo = o.minThicknessMm as number;
        const hi = o.maxThicknessMm as number;
        if (lo > hi) fail(f, 'minThicknessMm must not exceed maxThicknessMm');
        if (!(lo > previousMax)) fail(f, 'rows must be in increasing, non-overlapping thickness order');
        previousMax = hi;
      });
    } else fail(`${field}.kind`, "must be 'fixed', 'thickness_table', 'inverse_square' or 'from_gradient'");
  };
  const soakTime = (v: unknown, field: string): void => {
    const s = obj(v, field);
    if (!s) return;
    sourced(s.minimumH, `${field}.minimumH`, 0);
    if (s.hoursPerMm !== undefined) sourced(s.hoursPerMm, `${field}.hoursPerMm`, 0);
    if (s.maximumH !== undefined) sourced(s.maximumH, `${field}.maximumH`, 0);
  };

  const e = obj(entry, '(entry)');
  if (!e) throw new DomainError('invalid_input', 'guidance entry must be an object', problems);
  if (typeof e.key !== 'string' || !KEY_PATTERN.test(e.key)) fail('key', "must look like 'material.variant' (lower case, digits, hyphens, dots)");
  text(e.title, 'title');
  if (!FAMILIES.includes(e.materialFamily as string)) fail('materialFamily', `must be one of ${FAMILIES.join(', ')}`);
  if (e.preSteps !== undefined) {
    list(e.preSteps, 'preSteps', (p, f) => {
      const o = obj(p, f);
      if (!o) return;
      if (o.kind !== 'drying') fail(`${f}.kind`, "must be 'drying'");
      sourced(o.temperatureC, `${f}.temperatureC`);
      source(o.source, `${f}.source`);
      let previous = 0;
      list(o.rows, `${f}.rows`, (row, rf) => {
        const r = obj(row, rf);
        if (!r) return;
        num(r.thicknessMm, `${rf}.thicknessMm`, 0, true);
        num(r.durationH, `${rf}.durationH`, 0, true);
        if (!((r.thicknessMm as number) > previous)) fail(rf, 'rows must be in increasing thickness order');
        previous = r.thicknessMm as number;
      });
    }, false);
  }
  list(e.heating, 'heating', (h, f) => {
    const o = obj(h, f);
    if (!o) return;
    rate(o.rate, `${f}.rate`);
    target(o.to, `${f}.to`);
    if (o.hold !== undefined) soakTime(o.hold, `${f}.hold`);
  }, false);
  rate(e.heatingRateToSoak, 'heatingRateToSoak');
  const soak = obj(e.soak, 'soak');
  if (soak) {
    target(soak.temperature, 'soak.temperature');
    soakTime(soak.time, 'soak.time');
  }
  list(e.cooling, 'cooling', (c, f) => {
    const o = obj(c, f);
    if (!o) return;
    rate(o.rate, `${f}.rate`);
    target(o.to, `${f}.to`);
    const m = o.minimumDuration;
    if (m !== undefined) {
      const mo = obj(m, `${f}.minimumDuration`);
      if (mo) {
        sourced(mo.hoursPerMm, `${f}.minimumDuration.hoursPerMm`, 0);
        sourced(mo.appliesAboveThicknessMm, `${f}.minimumDuration.appliesAboveThicknessMm`, 0);
      }
    }
  });
  sourced(e.thermalDiffusivityMm2PerS, 'thermalDiffusivityMm2PerS', 0, true);
  sourced(e.allowedGradientC, 'allowedGradientC', 0, true);
  if (e.notes !== undefined) list(e.notes, 'notes', text, false);

  if (problems.length > 0) {
    throw new DomainError('invalid_input', `guidance entry has ${problems.length} problem(s)`, problems);
  }
  return entry as AnnealingGuidanceEntry;
}
