import { sql } from 'drizzle-orm';
import { DomainError } from '../../src/errors/DomainError.ts';
import type { Db } from '../Db.ts';
import { rowsOf } from '../rowsOf.ts';
import type { ArchiveTable } from './archiveTables.ts';
import type { ArchiveStage } from './createArchiveStage.ts';

/**
 * Shared rows (lab_id null, such as a published catalogue) are built by each database with ids
 * of its own. For each archived shared row: the same id here must be the same row; else a row
 * here with the same content (key and write time aside) takes its place, and the lab's staged
 * references are pointed at it; else the row stays staged to be inserted with its id. Returns
 * how many references were re-pointed. Lab rows keep their ids; only these references change.
 *
 * @example
 * await mapSharedRows(db, sharedStage, guidanceTable, stages, tables); // 3
 */
export async function mapSharedRows(db: Db, shared: ArchiveStage, table: ArchiveTable, stages: ArchiveStage[], tables: ArchiveTable[]): Promise<number> {
  const id = table.key[0]!.name;
  const ignored = [...table.key.map((k) => k.name), ...table.writeTimeColumns];
  const compared = JSON.stringify(shared.part.columns.filter((c) => !ignored.includes(c)));
  const contentOf = (alias: string) =>
    sql`(select jsonb_object_agg(e.key, e.value) from jsonb_each(to_jsonb(${sql.identifier(alias)})) e where e.key in (select jsonb_array_elements_text(${compared}::jsonb)))`;
  const T = sql.identifier(table.name);
  const S = sql.identifier(shared.stage);
  const [clash] = rowsOf<{ id: string }>(
    await db.execute(sql`select s.${sql.identifier(id)}::text as id from ${S} s join ${T} t on t.${sql.identifier(id)} = s.${sql.identifier(id)}
      where t.lab_id is not null or ${contentOf('t')} is distinct from ${contentOf('s')} limit 1`),
  );
  if (clash) throw new DomainError('conflict', `The archive's shared ${table.name} row ${clash.id} differs from the row with that id in this database.`);
  const map = `${shared.stage}_map`.slice(0, 63);
  await db.execute(sql`create temporary table ${sql.identifier(map)} on commit drop as
    select s.${sql.identifier(id)} as old_id, (select t.${sql.identifier(id)} from ${T} t where t.lab_id is null and ${contentOf('t')} = ${contentOf('s')} limit 1) as new_id
    from ${S} s where not exists (select 1 from ${T} t where t.${sql.identifier(id)} = s.${sql.identifier(id)})`);
  await db.execute(sql`delete from ${S} s where exists (select 1 from ${T} t where t.${sql.identifier(id)} = s.${sql.identifier(id)})
    or s.${sql.identifier(id)} in (select old_id from ${sql.identifier(map)} where new_id is not null)`);
  let repointed = 0;
  for (const stage of stages) {
    if (stage.part.scope !== 'lab') continue;
    const from = tables.find((t) => t.name === stage.part.table);
    for (const ref of from?.references.filter((r) => r.table === table.name && r.foreignColumn === id) ?? []) {
      const C = sql.identifier(ref.column);
      const changed = rowsOf<{ n: number }>(
        await db.execute(sql`with moved as (update ${sql.identifier(stage.stage)} x set ${C} = m.new_id from ${sql.identifier(map)} m
          where x.${C} = m.old_id and m.new_id is not null returning 1) select count(*)::int as n from moved`),
      );
      repointed += Number(changed[0]?.n ?? 0);
    }
  }
  await db.execute(sql`drop table ${sql.identifier(map)}`);
  return repointed;
}
