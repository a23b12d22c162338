import { is } from 'drizzle-orm';
import { getTableConfig, PgTable } from 'drizzle-orm/pg-core';
import * as schema from '../schema/index.ts';

/** A single-column reference from an archived table to another table's key. */
export interface ArchiveReference {
  column: string;
  table: string;
  foreignColumn: string;
}

export interface ArchiveTable {
  name: string;
  /** Key columns in keyset order; the primary key, composite where the table has one. */
  key: { name: string; sqlType: string }[];
  /** True where shared rows (lab_id null) live beside the labs' own rows. */
  sharesRows: boolean;
  references: ArchiveReference[];
  identityColumns: string[];
  /** Columns whose default is the time of writing; two copies of a shared row may differ there. */
  writeTimeColumns: string[];
}

export interface ArchivePlan {
  tables: ArchiveTable[];
  /** Tables with no lab_id: shared catalogues that every database builds for itself. */
  sharedCatalogues: string[];
}

// The lab row itself travels in the archive's opening; keys are secrets and never leave.
const NOT_ARCHIVED = new Set(['labs', 'api_keys']);

function describe(table: PgTable): ArchiveTable & { dependsOn: Set<string>; hasLabId: boolean } {
  const config = getTableConfig(table);
  const composite = config.primaryKeys[0]?.columns.map((c) => c.name);
  const keyNames = composite ?? config.columns.filter((c) => c.primary).map((c) => c.name);
  const byName = new Map(config.columns.map((c) => [c.name, c]));
  const references: ArchiveReference[] = [];
  const dependsOn = new Set<string>();
  for (const fk of config.foreignKeys) {
    const ref = fk.reference();
    const target = getTableConfig(ref.foreignTable).name;
    if (target !== config.name) dependsOn.add(target);
    if (ref.columns.length === 1) references.push({ column: ref.columns[0]!.name, table: target, foreignColumn: ref.foreignColumns[0]!.name });
  }
  return {
    name: config.name,
    key: keyNames.map((name) => ({ name, sqlType: byName.get(name)!.getSQLType() })),
    sharesRows: byName.get('lab_id')?.notNull === false,
    references,
    identityColumns: config.columns.filter((c) => (c as { generatedIdentity?: unknown }).generatedIdentity).map((c) => c.name),
    writeTimeColumns: config.columns.filter((c) => c.hasDefault && c.columnType === 'PgTimestamp').map((c) => c.name),
    dependsOn,
    hasLabId: byName.has('lab_id'),
  };
}

/**
 * Every lab-scoped table of the drizzle schema (those with a lab_id column, keys excepted), in
 * an order where each table comes after the tables it references, so a restore can insert
 * table by table. Found by walking the schema, so a table added later is archived without
 * changes here.
 *
 * @example
 * archiveTables().tables.map((t) => t.name).slice(0, 3);
 * // ['annealing_guidance_entries', 'annealing_house_cycles', 'materials']
 */
export function archiveTables(): ArchivePlan {
  const all = (Object.values(schema) as unknown[]).filter((v): v is PgTable => is(v, PgTable)).map(describe);
  const sharedCatalogues = all.filter((t) => !NOT_ARCHIVED.has(t.name) && !t.hasLabId).map((t) => t.name);
  const pending = all.filter((t) => !NOT_ARCHIVED.has(t.name) && t.hasLabId);
  const archived = new Set(pending.map((t) => t.name));
  const placed = new Set<string>();
  const tables: ArchiveTable[] = [];
  while (pending.length > 0) {
    const ready = pending.filter((t) => [...t.dependsOn].every((d) => placed.has(d) || !archived.has(d))).sort((a, b) => a.name.localeCompare(b.name));
    if (ready.length === 0) throw new Error(`Foreign keys form a cycle among ${pending.map((t) => t.name).join(', ')}; the archive cannot order them.`);
    const next = ready[0]!;
    pending.splice(pending.indexOf(next), 1);
    placed.add(next.name);
    const { dependsOn: _dependsOn, hasLabId: _hasLabId, ...table } = next;
    tables.push(table);
  }
  return { tables, sharedCatalogues };
}
