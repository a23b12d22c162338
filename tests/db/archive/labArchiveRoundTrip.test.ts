import { describe, expect, it } from 'vitest';
import { importLabArchive } from '../../../db/archive/importLabArchive.ts';
import { archiveLines, archiveOf, chunksOf } from '../../support/archiveBytes.ts';
import { demoArchive } from '../../support/demoArchive.ts';
import { rolledBack } from '../../support/rolledBack.ts';
import { testDatabase } from '../../support/testDatabase.ts';

// The fields that must differ between two archives of the same lab: when each archive was
// written (createdAt of the opening and manifest). Lab id, name and creation time travel with
// the lab into a new lab; parts carry no lab id at all, so they must match byte for byte.
function comparable(lines: string[]): string[] {
  return lines.map((line) => {
    const tag = line.startsWith('@open ') ? '@open ' : line.startsWith('@manifest ') ? '@manifest ' : undefined;
    if (!tag) return line;
    const { createdAt: _createdAt, ...rest } = JSON.parse(line.slice(tag.length)) as Record<string, unknown>;
    return `${tag}${JSON.stringify(rest)}`;
  });
}

describe('lab archive round trip', () => {
  it('restores the demo lab into a new lab with the same records, and exports it again identically', async () => {
    const db = await testDatabase();
    const first = await demoArchive();
    const firstLines = archiveLines(first.bytes);
    const manifest = JSON.parse(firstLines.at(-1)!.slice('@manifest '.length));
    const rowsOf = (name: string) => manifest.parts.find((p: { name: string }) => p.name === name)?.rows;
    expect(rowsOf('readings')).toBeGreaterThan(20);
    expect(rowsOf('annealing_guidance_entries.shared')).toBeGreaterThanOrEqual(1);
    expect(rowsOf('annealing_guidance_entries')).toBeGreaterThanOrEqual(2);
    expect(rowsOf('oven_log_samples')).toBeGreaterThanOrEqual(3);
    expect(manifest.parts.map((p: { name: string }) => p.name)).not.toContain('api_keys');
    expect(first.bytes.toString('latin1')).not.toMatch(/key_hash/);
    expect(manifest.catalogueVersions.annealing_guidance_entries).toContain('archive-test-1');

    await rolledBack(db, async (tx) => {
      const summary = await importLabArchive(tx, { newLab: true }, chunksOf(first.bytes));
      expect(summary.labId).toBe(first.labId);
      expect(summary.adminKey?.secret).toMatch(/^flk_/);
      expect(summary.totalRows).toBe(manifest.parts.reduce((n: number, p: { rows: number }) => n + p.rows, 0));
      const second = archiveLines(await archiveOf(tx, summary.labId));
      expect(comparable(second)).toEqual(comparable(firstLines));
    });
  });

  it('restores into an empty lab through the same path, the lab keeping its own id and name', async () => {
    const db = await testDatabase();
    const first = await demoArchive();
    await rolledBack(db, async (tx) => {
      const { createLab } = await import('../../../db/operations/createLab.ts');
      const lab = await createLab(tx, 'receiving lab');
      const summary = await importLabArchive(tx, { labId: lab.labId }, chunksOf(first.bytes));
      expect(summary.labName).toBe('receiving lab');
      const again = archiveLines(await archiveOf(tx, lab.labId));
      const parts = (lines: string[]) => lines.filter((l) => !l.startsWith('@open ') && !l.startsWith('@manifest '));
      expect(parts(again)).toEqual(parts(archiveLines(first.bytes)));
    });
  });
});
