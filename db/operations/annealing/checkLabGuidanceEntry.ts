import type { AnnealingGuidanceEntry } from '../../../src/annealing/AnnealingGuidance.ts';
import { generateAnnealingPlan } from '../../../src/annealing/generateAnnealingPlan.ts';
import { validateGuidanceEntry } from '../../../src/annealing/validateGuidanceEntry.ts';
import { DomainError } from '../../../src/errors/DomainError.ts';
import { GUIDANCE_FAMILY_OF_MATERIAL, type MaterialFamily } from './guidanceFamilies.ts';

const TRIAL_THICKNESS_MM = 6;

/**
 * A lab's entry, checked as the catalogue's are, plus a trial plan: an entry that validates
 * field by field can still be unusable (a soak below room temperature), and the lab should
 * learn that when it adds the entry, not when a technician needs a plan. Field names are
 * prefixed so they point into the request body.
 */
export function checkLabGuidanceEntry(raw: unknown, appliesToFamily: MaterialFamily | undefined): { entry: AnnealingGuidanceEntry; family: MaterialFamily } {
  let entry: AnnealingGuidanceEntry;
  try {
    entry = validateGuidanceEntry(raw);
    generateAnnealingPlan({ guidance: entry, maxSectionThicknessMm: TRIAL_THICKNESS_MM });
  } catch (error) {
    if (!(error instanceof DomainError)) throw error;
    const problems = error.problems.length > 0 ? error.problems : [{ field: '(entry)', message: error.message }];
    throw new DomainError(error.code, `The guidance entry is not usable: ${error.message}`, problems.map((p) => ({ ...p, field: `entry.${p.field}` })));
  }
  if (entry.materialFamily === 'other') {
    if (!appliesToFamily) throw new DomainError('invalid_input', "An entry for family 'other' must say which material family it serves.", [{ field: 'appliesToFamily', message: "required when entry.materialFamily is 'other'" }]);
    return { entry, family: appliesToFamily };
  }
  const family = appliesToFamily ?? (Object.keys(GUIDANCE_FAMILY_OF_MATERIAL) as MaterialFamily[]).find((f) => GUIDANCE_FAMILY_OF_MATERIAL[f] === entry.materialFamily)!;
  if (GUIDANCE_FAMILY_OF_MATERIAL[family] !== entry.materialFamily) {
    throw new DomainError('invalid_input', `The entry is written for ${entry.materialFamily}, not ${family}.`, [{ field: 'appliesToFamily', message: `does not match entry.materialFamily ${entry.materialFamily}` }]);
  }
  return { entry, family };
}
