import type { Db } from '../Db.ts';
import type { ArchiveProgress } from './ArchiveProgress.ts';
import { exportLabArchive } from './exportLabArchive.ts';

/**
 * A lab's archive as a gzip byte stream that is produced as it is read: each page waits until
 * the reader has taken the previous ones. An export that fails half-way aborts the stream, so
 * the file lacks its closing manifest and any import refuses it.
 *
 * @example
 * await pipeline(Readable.fromWeb(labArchiveStream(db, labId)), createWriteStream('lab.flarchive'));
 */
export function labArchiveStream(db: Db, labId: string, onProgress?: ArchiveProgress): ReadableStream<Uint8Array> {
  const gzip = new CompressionStream('gzip');
  const writer = gzip.writable.getWriter();
  const encoder = new TextEncoder();
  const write = async (text: string) => {
    await writer.ready;
    await writer.write(encoder.encode(text));
  };
  exportLabArchive(db, labId, write, onProgress).then(
    () => writer.close(),
    (error: unknown) => writer.abort(error).catch(() => {}),
  ).catch(() => {});
  return gzip.readable as ReadableStream<Uint8Array>;
}
