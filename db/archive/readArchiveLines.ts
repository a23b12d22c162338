import { Readable } from 'node:stream';
import { StringDecoder } from 'node:string_decoder';
import { createGunzip } from 'node:zlib';
import { ARCHIVE_MAX_LINE_CHARS } from './archiveFormat.ts';

/** The gzip layer failed: the bytes are damaged or cut short. Says where the reader was. */
export class ArchiveBytesError extends Error {}

/**
 * The lines of a gzip archive as they arrive, without holding more than one chunk and one
 * unfinished line. Damaged or cut-short compression becomes an ArchiveBytesError.
 *
 * @example
 * for await (const line of readArchiveLines(createReadStream('lab.flarchive'))) console.log(line.slice(0, 5));
 * // '@open' then rows…
 */
export async function* readArchiveLines(source: AsyncIterable<Uint8Array>): AsyncGenerator<string> {
  const gunzip = createGunzip();
  const input = Readable.from(source);
  input.on('error', (error) => gunzip.destroy(error));
  input.pipe(gunzip);
  const decoder = new StringDecoder('utf8');
  let pending = '';
  try {
    for await (const chunk of gunzip as AsyncIterable<Buffer>) {
      pending += decoder.write(chunk);
      let newline = pending.indexOf('\n');
      let start = 0;
      while (newline !== -1) {
        yield pending.slice(start, newline);
        start = newline + 1;
        newline = pending.indexOf('\n', start);
      }
      pending = pending.slice(start);
      if (pending.length > ARCHIVE_MAX_LINE_CHARS) throw new ArchiveBytesError(`a line is longer than ${ARCHIVE_MAX_LINE_CHARS} characters`);
    }
  } catch (error) {
    if (error instanceof ArchiveBytesError) throw error;
    throw new ArchiveBytesError(`the compressed data is damaged or cut short (${(error as Error).message})`);
  } finally {
    input.destroy();
  }
  pending += decoder.end();
  if (pending.length > 0) yield pending;
}
