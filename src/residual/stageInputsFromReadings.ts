import { requireNumber } from '../guards/requireNumber.ts';
import type { StageName, StageReading, LoadedStageReading } from './SiteStagesTypes.ts';

export type RecordedStage = 'before_load' | 'under_load' | 'after_unload' | 'before_anneal' | 'after_anneal' | 'inspection';

/** A stored reading as the analysis needs it. */
export interface RecordedReading {
  id: string;
  stage: RecordedStage;
  observedAt: Date;
  /** Fringe order and its standard uncertainty at the reading's own wavelength. */
  fringeOrder: number;
  fringeOrderUncertainty: number;
  /** The wavelength the order refers to (the white-light reference for white light). */
  wavelengthNm: number;
  sign: 'positive' | 'negative' | 'unknown';
  loadN: number | null;
}

export interface StageInputs {
  stages: Partial<Record<Exclude<StageName, 'underLoad'>, StageReading>> & { underLoad?: LoadedStageReading };
  /** Which stored reading fed each stage. */
  readingIds: Partial<Record<StageName, string>>;
  /** The reading that tells what the model carries now: the latest one taken without load. */
  current: { readingId: string; stage: RecordedStage; observedAt: Date; reading: StageReading } | null;
}

const STAGE_OF: Record<Exclude<RecordedStage, 'inspection'>, StageName> = {
  before_load: 'fabrication',
  under_load: 'underLoad',
  after_unload: 'afterUnload',
  before_anneal: 'beforeAnneal',
  after_anneal: 'afterAnneal',
};

/**
 * Picks, per stage, the latest reading and expresses every order at one reference
 * wavelength (the fringe value's): the retardation δ = N·λ is what the model holds, so
 * N_ref = N·λ/λ_ref and u scales by the same ratio. A known sign makes the order signed.
 *
 * @example
 * stageInputsFromReadings([{ id: 'r1', stage: 'before_load', observedAt: new Date('2026-11-01'),
 *   fringeOrder: 0.2, fringeOrderUncertainty: 0.01, wavelengthNm: 546.1, sign: 'unknown', loadN: null }], 577);
 * // stages.fabrication = { order: { value: 0.18929, uncertainty: 0.009464 }, signKnown: false };
 * // current.stage 'before_load'
 */
export function stageInputsFromReadings(readings: readonly RecordedReading[], referenceWavelengthNm: number): StageInputs {
  requireNumber('referenceWavelengthNm', referenceWavelengthNm, { min: 380, max: 780 });
  const byTime = [...readings].sort((a, b) => a.observedAt.getTime() - b.observedAt.getTime() || a.id.localeCompare(b.id));
  const result: StageInputs = { stages: {}, readingIds: {}, current: null };
  for (const r of byTime) {
    const scale = requireNumber('wavelengthNm', r.wavelengthNm, { min: 380, max: 780 }) / referenceWavelengthNm;
    const order = r.fringeOrder * scale;
    const reading: StageReading = {
      order: { value: r.sign === 'negative' ? -order : order, uncertainty: r.fringeOrderUncertainty * scale },
      signKnown: r.sign !== 'unknown',
    };
    if (r.stage !== 'under_load') result.current = { readingId: r.id, stage: r.stage, observedAt: r.observedAt, reading };
    if (r.stage === 'inspection') continue;
    const stage = STAGE_OF[r.stage];
    if (stage === 'underLoad') result.stages.underLoad = { ...reading, loadN: requireNumber('loadN', r.loadN ?? Number.NaN, { above: 0 }) };
    else result.stages[stage] = reading;
    result.readingIds[stage] = r.id;
  }
  return result;
}
