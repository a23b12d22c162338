import { createHash } from 'node:crypto';
import { gzipSync } from 'node:zlib';
import type { ArchiveManifest, ArchiveOpening } from '../../db/archive/archiveFormat.ts';
import { archiveLines } from './archiveBytes.ts';

export interface OpenArchive {
  opening: ArchiveOpening;
  rows: Map<string, Record<string, unknown>[]>;
}

/**
 * Takes an archive apart, lets a test change it, and writes it back with consistent counts and
 * digests, the way a writer of another schema version would have written it.
 */
export function rewriteArchive(bytes: Uint8Array, edit: (archive: OpenArchive) => void): Buffer {
  const lines = archiveLines(bytes);
  const opening = JSON.parse(lines[0]!.slice('@open '.length)) as ArchiveOpening;
  const rows = new Map<string, Record<string, unknown>[]>();
  let current: string | undefined;
  for (const line of lines.slice(1)) {
    if (line.startsWith('@part ')) rows.set((current = (JSON.parse(line.slice(6)) as { name: string }).name), []);
    else if (line.startsWith('@')) current = undefined;
    else rows.get(current!)!.push(JSON.parse(line) as Record<string, unknown>);
  }
  const archive = { opening, rows };
  edit(archive);
  const out = [`@open ${JSON.stringify({ ...opening, parts: opening.parts.map((p) => ({ ...p, rows: rows.get(p.name)!.length })) })}`];
  const parts: ArchiveManifest['parts'] = [];
  for (const part of opening.parts) {
    const text = rows.get(part.name)!.map((r) => `${JSON.stringify(r)}\n`).join('');
    const sha256 = createHash('sha256').update(text).digest('hex');
    out.push(`@part ${JSON.stringify({ name: part.name })}`, ...(text ? [text.slice(0, -1)] : []), `@end ${JSON.stringify({ name: part.name, rows: rows.get(part.name)!.length, sha256 })}`);
    parts.push({ ...part, rows: rows.get(part.name)!.length, sha256 });
  }
  out.push(`@manifest ${JSON.stringify({ ...opening, parts })}`);
  return gzipSync(`${out.join('\n')}\n`);
}
