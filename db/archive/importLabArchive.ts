import { sql } from 'drizzle-orm';
import type { Db } from '../Db.ts';
import type { CreatedApiKey } from '../operations/keys/createApiKey.ts';
import { rowsOf } from '../rowsOf.ts';
import type { ArchiveOpening } from './archiveFormat.ts';
import type { ArchiveProgress } from './ArchiveProgress.ts';
import { archiveTables } from './archiveTables.ts';
import { checkArchiveSchema, type SchemaCheck } from './checkArchiveSchema.ts';
import { checkLabIsEmpty } from './checkLabIsEmpty.ts';
import { type ArchiveStage, createArchiveStage } from './createArchiveStage.ts';
import { createArchivedLab } from './createArchivedLab.ts';
import { insertStagedPart } from './insertStagedPart.ts';
import { mapSharedRows } from './mapSharedRows.ts';
import { readArchive } from './readArchive.ts';
import { refuseExistingLab } from './refuseExistingLab.ts';
import { refuseIdClashes } from './refuseIdClashes.ts';
import { stageArchiveRows } from './stageArchiveRows.ts';

/** Into an existing lab that has no records (the API), or into a new lab made from the archive's (the script). */
export type ImportTarget = { labId: string } | { newLab: true };

export interface LabImportSummary {
  labId: string;
  labName: string;
  archivedLabId: string;
  parts: { name: string; rows: number }[];
  totalRows: number;
  schema: SchemaCheck & { archive: string };
  /** References to shared rows that were pointed at this database's copy of the same row. */
  repointedSharedReferences: number;
  /** Only for a new lab: its first admin key, secret included, shown once. */
  adminKey?: CreatedApiKey;
}

/**
 * Restores a whole lab from an archive, all or nothing (one transaction, a savepoint inside a
 * caller's). Order: the opening's format and schema are checked and the target is checked for
 * room; every part is loaded into temporary tables while its count and SHA-256 are checked;
 * only after the closing manifest has been verified is any lasting table written. Ids are kept.
 *
 * @example
 * const summary = await importLabArchive(db, { newLab: true }, createReadStream('demo.flarchive'));
 * summary.parts.find((p) => p.name === 'readings')?.rows; // 35
 */
export async function importLabArchive(db: Db, target: ImportTarget, source: AsyncIterable<Uint8Array>, onProgress?: ArchiveProgress): Promise<LabImportSummary> {
  const { tables } = archiveTables();
  const tableOf = (name: string) => tables.find((t) => t.name === name)!;
  return db.transaction(async (tx) => {
    // Archived rows carry UTC text; the session zone only matters for timestamps written as text.
    await tx.execute(sql`set local timezone to 'UTC'`);
    let opening: ArchiveOpening | undefined;
    let schema: SchemaCheck | undefined;
    let starters: string[] = [];
    const stages = new Map<string, ArchiveStage>();
    let doneRows = 0;
    let totalRows = 0;
    for await (const event of readArchive(source)) {
      if (event.kind === 'open') {
        opening = event.opening;
        schema = await checkArchiveSchema(tx, opening.schema);
        if ('labId' in target) starters = await checkLabIsEmpty(tx, target.labId, tables);
        else await refuseExistingLab(tx, opening.lab);
        for (const part of opening.parts) stages.set(part.name, await createArchiveStage(tx, part));
        totalRows = opening.parts.reduce((n, p) => n + p.rows, 0);
      } else if (event.kind === 'rows') {
        await stageArchiveRows(tx, stages.get(event.part.name)!, event.lines);
        doneRows += event.lines.length;
        onProgress?.({ phase: 'verify', part: event.part.name, partRows: event.partRows, partTotal: event.part.rows, doneRows, totalRows });
      }
    }
    // readArchive ends only after the manifest checked out, so from here on the archive is sound.
    const archive = opening!;
    let labId: string;
    let adminKey: CreatedApiKey | undefined;
    if ('labId' in target) {
      labId = target.labId;
      if (starters.length > 0) await tx.execute(sql`delete from materials where lab_id = ${labId}::uuid and id in (select jsonb_array_elements_text(${JSON.stringify(starters)}::jsonb)::uuid)`);
    } else {
      adminKey = await createArchivedLab(tx, archive.lab);
      labId = archive.lab.id;
    }
    const staged = [...stages.values()];
    let repointed = 0;
    for (const stage of staged) if (stage.part.scope === 'shared') repointed += await mapSharedRows(tx, stage, tableOf(stage.part.table), staged, tables);
    for (const stage of staged) if (stage.part.scope === 'lab') await refuseIdClashes(tx, stage, tableOf(stage.part.table));
    doneRows = 0;
    for (const stage of staged) {
      await insertStagedPart(tx, stage, tableOf(stage.part.table), labId);
      await tx.execute(sql`drop table ${sql.identifier(stage.stage)}`);
      doneRows += stage.part.rows;
      onProgress?.({ phase: 'restore', part: stage.part.name, partRows: stage.part.rows, partTotal: stage.part.rows, doneRows, totalRows });
    }
    const [lab] = rowsOf<{ name: string }>(await tx.execute(sql`select name from labs where id = ${labId}::uuid`));
    return {
      labId,
      labName: lab?.name ?? archive.lab.name,
      archivedLabId: archive.lab.id,
      parts: archive.parts.map((p) => ({ name: p.name, rows: p.rows })),
      totalRows,
      schema: { ...schema!, archive: archive.schema.migration },
      repointedSharedReferences: repointed,
      ...(adminKey ? { adminKey } : {}),
    };
  });
}
