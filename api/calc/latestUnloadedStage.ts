import type { StageName } from '../../src/residual/SiteStagesTypes.ts';

/** Stated in every stage-analysis answer, so a client sees why one reading was judged. */
export const JUDGED_RESIDUAL_RULE =
  'the residual judged is the one the model carries now: the latest reading present in the sequence ' +
  'fabrication → underLoad → afterUnload → beforeAnneal → afterAnneal that was taken without load ' +
  '(the underLoad reading is never a residual)';

const UNLOADED_NEWEST_FIRST: readonly StageName[] = ['afterAnneal', 'beforeAnneal', 'afterUnload', 'fabrication'];

export interface JudgedStage {
  stage: StageName | null;
  notes: string[];
}

/**
 * Which stage reading stands for the model's present residual (see JUDGED_RESIDUAL_RULE),
 * with a warning when a load came after it and no after-unload reading shows what it left.
 *
 * @example
 * latestUnloadedStage(new Set(['fabrication', 'underLoad', 'afterUnload', 'beforeAnneal']));
 * // { stage: 'beforeAnneal', notes: [] }
 * latestUnloadedStage(new Set(['fabrication', 'underLoad']));
 * // { stage: 'fabrication', notes: ['a load was applied after the fabrication reading ...'] }
 */
export function latestUnloadedStage(present: ReadonlySet<StageName>): JudgedStage {
  const stage = UNLOADED_NEWEST_FIRST.find((s) => present.has(s)) ?? null;
  if (stage === null) return { stage, notes: ['no reading without load was given, so there is no residual to judge'] };
  const loadedSince = stage === 'fabrication' && present.has('underLoad');
  return {
    stage,
    notes: loadedSince
      ? ['a load was applied after the fabrication reading and no after-unload reading was given: the present residual may differ by the permanent set']
      : [],
  };
}
