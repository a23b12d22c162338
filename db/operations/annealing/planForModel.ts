import type { AnnealingPlan } from '../../../src/annealing/AnnealingPlan.ts';
import { generateAnnealingPlan } from '../../../src/annealing/generateAnnealingPlan.ts';
import type { GeneratePlanInput } from '../../inputs/annealing.ts';
import type { Db } from '../../Db.ts';
import type { Actor } from '../Actor.ts';
import { type ChosenBy, chooseGuidanceEntry } from './chooseGuidanceEntry.ts';
import type { GuidanceEntryView } from './GuidanceEntryView.ts';
import { getModelMaterial } from './getModelMaterial.ts';

export interface ModelPlanDraft {
  entry: GuidanceEntryView;
  chosenBy: ChosenBy;
  thicknessMm: number;
  thicknessSource: 'model' | 'given';
  plan: AnnealingPlan;
}

/**
 * The plan a model would get, not yet stored: the guidance chosen for its material family and,
 * unless a thickness is given, the model's own thickness as its largest section.
 */
export async function planForModel(db: Db, actor: Actor, modelId: string, input: Omit<GeneratePlanInput, 'supersedesPlanId' | 'reason'>): Promise<ModelPlanDraft> {
  const { model, material } = await getModelMaterial(db, actor, modelId);
  const { entry, chosenBy } = await chooseGuidanceEntry(db, actor, material.family, input.guidanceEntryId);
  const thicknessMm = input.maxSectionThicknessMm ?? model.thicknessMm;
  const plan = generateAnnealingPlan({
    guidance: entry.entry,
    maxSectionThicknessMm: thicknessMm,
    ...(input.startTemperatureC !== undefined ? { startTemperatureC: input.startTemperatureC } : {}),
    ...(input.ovenLimits ? { ovenLimits: input.ovenLimits } : {}),
    ...(entry.catalogueVersion ? { catalogueVersion: entry.catalogueVersion } : {}),
  });
  return { entry, chosenBy, thicknessMm, thicknessSource: input.maxSectionThicknessMm === undefined ? 'model' : 'given', plan };
}
