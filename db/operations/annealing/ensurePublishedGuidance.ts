import { and, eq, isNull, sql } from 'drizzle-orm';
import { ANNEALING_GUIDANCE_CATALOGUE } from '../../../src/annealing/guidanceCatalogue.ts';
import type { Db } from '../../Db.ts';
import { annealingGuidanceEntries } from '../../schema/index.ts';
import { MATERIAL_FAMILY_OF_GUIDANCE } from './guidanceFamilies.ts';

/**
 * Makes sure the repository's catalogue version is in the database. Loaded on first use rather
 * than by a migration, so a new catalogue version needs no hand-written SQL, and rows of older
 * versions stay because stored plans point at them. Idempotent and safe under concurrency: the
 * unique (key, version) index lets the loser of a race insert nothing.
 */
export async function ensurePublishedGuidance(db: Db): Promise<void> {
  const { version, entries } = ANNEALING_GUIDANCE_CATALOGUE;
  const [present] = await db
    .select({ id: annealingGuidanceEntries.id })
    .from(annealingGuidanceEntries)
    .where(and(isNull(annealingGuidanceEntries.labId), eq(annealingGuidanceEntries.catalogueVersion, version)))
    .limit(1);
  if (present) return;
  const rows = entries.map((entry, position) => ({ key: entry.key, title: entry.title, family: MATERIAL_FAMILY_OF_GUIDANCE[entry.materialFamily], position, entry }));
  await db.execute(sql`
    insert into annealing_guidance_entries (key, title, material_family, catalogue_version, catalogue_position, entry)
    select x.key, x.title, x.family::material_family, ${version}, x.position, x.entry
    from jsonb_to_recordset(${JSON.stringify(rows)}::jsonb) as x(key text, title text, family text, position integer, entry jsonb)
    on conflict do nothing`);
}
