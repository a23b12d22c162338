import type { Db } from '../Db.ts';
import { createApiKey, type CreatedApiKey } from '../operations/keys/createApiKey.ts';
import { labs } from '../schema/index.ts';
import type { ArchiveOpening } from './archiveFormat.ts';

/**
 * The archive's lab as a new lab here, with its own id, name and creation time (a moved lab
 * keeps its identity) and no catalogue materials (the archive brings the lab's). Keys are never
 * archived, so it gets one fresh admin key, returned with its secret.
 *
 * @example
 * (await createArchivedLab(db, opening.lab)).secret.slice(0, 4); // 'flk_'
 */
export async function createArchivedLab(db: Db, lab: ArchiveOpening['lab']): Promise<CreatedApiKey> {
  await db.insert(labs).values({ id: lab.id, name: lab.name, createdAt: new Date(lab.createdAt) });
  return createApiKey(db, lab.id, { label: 'admin key made by lab import', role: 'admin' });
}
