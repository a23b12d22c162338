import type { Db } from '../db/Db.ts';
import type { CreatedApiKey } from '../db/operations/keys/createApiKey.ts';
import { createLab } from '../db/operations/createLab.ts';
import { labs } from '../db/schema/index.ts';
import { loadDemoScenario } from './loadDemoScenario.ts';

export interface FirstStart {
  labName: string;
  keys: CreatedApiKey[];
}

/**
 * On a database with no lab: loads the demo lab (or, with LOAD_DEMO=never, an empty lab) and
 * returns its keys so the caller can print them once. Returns null when labs already exist.
 */
export async function bootstrapEmptyDatabase(db: Db, mode: 'auto' | 'never'): Promise<FirstStart | null> {
  const [anyLab] = await db.select({ id: labs.id }).from(labs).limit(1);
  if (anyLab) return null;
  if (mode === 'never') {
    const lab = await createLab(db, 'My lab');
    return { labName: 'My lab', keys: [lab.adminKey] };
  }
  const demo = await loadDemoScenario(db);
  return { labName: demo.labName, keys: demo.keys };
}
