import { createHash } from 'node:crypto';
import { sql } from 'drizzle-orm';
import { DomainError } from '../../src/errors/DomainError.ts';
import type { Db } from '../Db.ts';
import { rowsOf } from '../rowsOf.ts';
import { ARCHIVE_FORMAT, ARCHIVE_FORMAT_VERSION, ARCHIVE_PAGE_ROWS, type ArchiveManifest, type ArchiveOpening } from './archiveFormat.ts';
import { archivePartScope } from './archivePartScope.ts';
import type { ArchiveProgress } from './ArchiveProgress.ts';
import { archiveTables } from './archiveTables.ts';
import { planArchiveParts } from './planArchiveParts.ts';
import { readArchivePage } from './readArchivePage.ts';
import { readCatalogueVersions } from './readCatalogueVersions.ts';
import { readSchemaVersion } from './readSchemaVersion.ts';

/**
 * Writes a whole lab as archive lines (uncompressed; the caller gzips) through `write`, which
 * should wait while the reader is behind, so memory holds one page whatever the lab's size.
 * Everything is read in one repeatable-read snapshot: counts and rows agree even while the
 * service keeps writing.
 *
 * @example
 * const manifest = await exportLabArchive(db, labId, async (text) => void file.write(text));
 * manifest.parts.find((p) => p.name === 'readings')?.rows; // 35
 */
export async function exportLabArchive(db: Db, labId: string, write: (text: string) => Promise<void>, onProgress?: ArchiveProgress): Promise<ArchiveManifest> {
  const { tables, sharedCatalogues } = archiveTables();
  return db.transaction(
    async (tx) => {
      // Row text must not depend on the server's settings, or the same lab would hash differently.
      await tx.execute(sql`set local timezone to 'UTC'`);
      await tx.execute(sql`set local extra_float_digits to 1`);
      const [lab] = rowsOf<{ id: string; name: string; created_at: string }>(
        await tx.execute(sql`select id, name, to_jsonb(created_at) #>> '{}' as created_at from labs where id = ${labId}::uuid`),
      );
      if (!lab) throw new DomainError('not_found', `No lab ${labId}.`);
      const parts = await planArchiveParts(tx, labId, tables);
      const opening: ArchiveOpening = {
        format: ARCHIVE_FORMAT,
        formatVersion: ARCHIVE_FORMAT_VERSION,
        createdAt: new Date().toISOString(),
        schema: (await readSchemaVersion(tx)).latest,
        lab: { id: lab.id, name: lab.name, createdAt: lab.created_at },
        parts: parts.map(({ source: _source, ...part }) => part),
        catalogueVersions: await readCatalogueVersions(tx, labId, parts, tables, sharedCatalogues),
      };
      await write(`@open ${JSON.stringify(opening)}\n`);
      const totalRows = parts.reduce((n, p) => n + p.rows, 0);
      let doneRows = 0;
      const digests: string[] = [];
      for (const part of parts) {
        await write(`@part ${JSON.stringify({ name: part.name })}\n`);
        const where = archivePartScope(part.source, part.scope, labId, tables);
        const hash = createHash('sha256');
        let rows = 0;
        let after: unknown[] | undefined;
        for (;;) {
          const page = await readArchivePage(tx, part.source, where, after, ARCHIVE_PAGE_ROWS);
          if (page.lines.length === 0) break;
          const text = `${page.lines.join('\n')}\n`;
          hash.update(text, 'utf8');
          await write(text);
          rows += page.lines.length;
          doneRows += page.lines.length;
          after = page.last;
          onProgress?.({ phase: 'export', part: part.name, partRows: rows, partTotal: part.rows, doneRows, totalRows });
          if (page.lines.length < ARCHIVE_PAGE_ROWS) break;
        }
        const sha256 = hash.digest('hex');
        digests.push(sha256);
        await write(`@end ${JSON.stringify({ name: part.name, rows, sha256 })}\n`);
      }
      const manifest: ArchiveManifest = { ...opening, parts: opening.parts.map((p, i) => ({ ...p, sha256: digests[i]! })) };
      await write(`@manifest ${JSON.stringify(manifest)}\n`);
      return manifest;
    },
    { isolationLevel: 'repeatable read', accessMode: 'read only' },
  );
}
