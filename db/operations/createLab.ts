import type { Db } from '../Db.ts';
import { MATERIAL_CATALOGUE } from '../catalogue/materialCatalogue.ts';
import { labs, materials } from '../schema/index.ts';
import { createApiKey, type CreatedApiKey } from './keys/createApiKey.ts';

/**
 * A new lab with its first admin key and the catalogue materials, in one transaction so a lab
 * never exists without a key.
 */
export async function createLab(db: Db, name: string): Promise<{ labId: string; adminKey: CreatedApiKey }> {
  return db.transaction(async (tx) => {
    const [lab] = await tx.insert(labs).values({ name }).returning();
    if (!lab) throw new Error('insert returned no row');
    await tx.insert(materials).values(MATERIAL_CATALOGUE.map((m) => ({ ...m, labId: lab.id })));
    const adminKey = await createApiKey(tx, lab.id, { label: 'first admin key', role: 'admin' });
    return { labId: lab.id, adminKey };
  });
}
