import { gunzipSync } from 'node:zlib';
import { labArchiveStream } from '../../db/archive/labArchiveStream.ts';
import type { Db } from '../../db/Db.ts';

/** A lab's whole archive in memory; fine for the small labs of tests. */
export async function archiveOf(db: Db, labId: string): Promise<Buffer> {
  const chunks: Uint8Array[] = [];
  for await (const chunk of labArchiveStream(db, labId) as unknown as AsyncIterable<Uint8Array>) chunks.push(chunk);
  return Buffer.concat(chunks);
}

/** The archive's lines, decompressed. */
export function archiveLines(bytes: Uint8Array): string[] {
  return gunzipSync(bytes).toString('utf8').split('\n').filter((l) => l !== '');
}

/** Bytes handed out in small pieces, the way a file or a request body arrives. */
export async function* chunksOf(bytes: Uint8Array, size = 4096): AsyncGenerator<Uint8Array> {
  for (let i = 0; i < bytes.length; i += size) yield bytes.subarray(i, i + size);
}
