import { createHash, type Hash } from 'node:crypto';
import { isDeepStrictEqual } from 'node:util';
import { DomainError } from '../../src/errors/DomainError.ts';
import { ARCHIVE_FORMAT, ARCHIVE_FORMAT_VERSION, ARCHIVE_PAGE_ROWS, type ArchiveManifest, type ArchiveOpening, type ArchivePartEnd, type ArchivePartPlan } from './archiveFormat.ts';
import { ArchiveBytesError, readArchiveLines } from './readArchiveLines.ts';

export type ArchiveEvent =
  | { kind: 'open'; opening: ArchiveOpening }
  | { kind: 'rows'; part: ArchivePartPlan; lines: string[]; partRows: number }
  | { kind: 'close'; manifest: ArchiveManifest };

function refused(where: string, what: string): DomainError {
  return new DomainError('invalid_input', `The archive is refused at ${where}: ${what}. Nothing was written.`, [{ field: where, message: what }]);
}

function control<T>(line: string, tag: string, where: string): T {
  try {
    return JSON.parse(line.slice(tag.length + 2)) as T;
  } catch {
    throw refused(where, `its ${tag} line is not valid JSON`);
  }
}

function checkOpening(line: string | undefined): ArchiveOpening {
  if (line === undefined || !line.startsWith('@open ')) throw refused('the opening', 'this is not a lab archive (no opening line)');
  const opening = control<ArchiveOpening>(line, 'open', 'the opening');
  if (opening.format !== ARCHIVE_FORMAT) throw refused('the opening', `format "${String(opening.format)}" is not ${ARCHIVE_FORMAT}`);
  if (!(opening.formatVersion <= ARCHIVE_FORMAT_VERSION)) {
    throw refused('the opening', `it was written in format version ${opening.formatVersion}; this installation reads up to ${ARCHIVE_FORMAT_VERSION}: update it first`);
  }
  if (!Array.isArray(opening.parts)) throw refused('the opening', 'it lists no parts');
  return opening;
}

interface OpenPart {
  plan: ArchivePartPlan;
  hash: Hash;
  rows: number;
  buffer: string[];
}

function checkEnd(part: OpenPart, line: string): string {
  const where = `part ${part.plan.name}`;
  const end = control<ArchivePartEnd>(line, 'end', where);
  const sha256 = part.hash.digest('hex');
  if (end.name !== part.plan.name) throw refused(where, `its closing line names part ${end.name}`);
  if (end.rows !== part.rows || part.rows !== part.plan.rows) throw refused(where, `${part.rows} rows read, ${part.plan.rows} announced, ${end.rows} closed`);
  if (end.sha256 !== sha256) throw refused(where, 'its SHA-256 does not match its rows (the part is damaged)');
  return sha256;
}

function checkManifest(opening: ArchiveOpening, digests: string[], line: string): ArchiveManifest {
  const manifest = control<ArchiveManifest>(line, 'manifest', 'the manifest');
  const { parts, ...head } = manifest;
  const { parts: openedParts, ...openedHead } = opening;
  if (!isDeepStrictEqual(head, openedHead)) throw refused('the manifest', 'it does not repeat the opening');
  const expected = openedParts.map((p, i) => ({ ...p, sha256: digests[i] }));
  const badPart = expected.findIndex((p, i) => !isDeepStrictEqual(parts?.[i], p));
  if (badPart !== -1 || parts.length !== expected.length) throw refused(`part ${expected[badPart]?.name ?? 'list'}`, 'the manifest disagrees with its count or SHA-256');
  return manifest;
}

/**
 * Reads an archive as events, checking everything on the way: format and version, every part
 * in the announced order with its row count and SHA-256, and a closing manifest that repeats
 * the opening. Rows are handed out in chunks as they pass; a caller must not write anything
 * lasting before the 'close' event, because a later part may still be refused. Every refusal
 * names the part that failed.
 *
 * @example
 * for await (const event of readArchive(file)) if (event.kind === 'close') console.log(event.manifest.parts.length);
 */
export async function* readArchive(source: AsyncIterable<Uint8Array>): AsyncGenerator<ArchiveEvent> {
  let opening: ArchiveOpening | undefined;
  let part: OpenPart | undefined;
  let manifest: ArchiveManifest | undefined;
  const digests: string[] = [];
  const where = () => (part ? `part ${part.plan.name} (after ${part.rows} of ${part.plan.rows} rows)` : !opening ? 'the opening' : digests.length < opening.parts.length ? `part ${opening.parts[digests.length]!.name}` : 'the manifest');
  try {
    for await (const line of readArchiveLines(source)) {
      if (!opening) {
        opening = checkOpening(line);
        yield { kind: 'open', opening };
      } else if (manifest) {
        if (line.trim() !== '') throw refused('the manifest', 'data follows the closing manifest');
      } else if (part) {
        if (!line.startsWith('@')) {
          part.hash.update(`${line}\n`, 'utf8');
          part.rows += 1;
          part.buffer.push(line);
          if (part.rows > part.plan.rows) throw refused(`part ${part.plan.name}`, `more rows than the ${part.plan.rows} announced`);
          if (part.buffer.length >= ARCHIVE_PAGE_ROWS) yield { kind: 'rows', part: part.plan, lines: part.buffer.splice(0), partRows: part.rows };
        } else if (line.startsWith('@end ')) {
          if (part.buffer.length > 0) yield { kind: 'rows', part: part.plan, lines: part.buffer.splice(0), partRows: part.rows };
          digests.push(checkEnd(part, line));
          part = undefined;
        } else throw refused(`part ${part.plan.name}`, 'it has no closing line');
      } else if (line.startsWith('@part ')) {
        const next = opening.parts[digests.length];
        const named = control<{ name: string }>(line, 'part', where());
        if (!next || named.name !== next.name) throw refused(`part ${named.name}`, `expected ${next ? `part ${next.name}` : 'the manifest'} here`);
        part = { plan: next, hash: createHash('sha256'), rows: 0, buffer: [] };
      } else if (line.startsWith('@manifest ')) {
        if (digests.length < opening.parts.length) throw refused(where(), 'the manifest comes before this part');
        manifest = checkManifest(opening, digests, line);
      } else throw refused(where(), 'a line stands outside any part');
    }
  } catch (error) {
    if (error instanceof ArchiveBytesError) throw refused(where(), error.message);
    throw error;
  }
  if (!manifest) throw refused(where(), 'the archive ends here (it is truncated)');
  yield { kind: 'close', manifest };
}
