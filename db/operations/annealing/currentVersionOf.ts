import { sql } from 'drizzle-orm';
import type { Db } from '../../Db.ts';
import { rowsOf } from '../../rowsOf.ts';

/** The newest amendment in an entry's chain (the entry itself when it was never amended). */
export async function currentVersionOf(db: Db, entryId: string): Promise<string> {
  const result = await db.execute(sql`
    with recursive chain as (
      select id, 0 as depth from annealing_guidance_entries where id = ${entryId}
      union all
      select e.id, c.depth + 1 from annealing_guidance_entries e join chain c on e.supersedes_id = c.id
    )
    select id from chain order by depth desc limit 1`);
  return rowsOf<{ id: string }>(result)[0]?.id ?? entryId;
}
