import { rename, rm } from 'node:fs/promises';
import { createWriteStream } from 'node:fs';
import { Readable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import { parseArgs } from 'node:util';
import { labArchiveStream } from '../db/archive/labArchiveStream.ts';
import { findLab } from './findLab.ts';
import { openScriptDatabase } from './openScriptDatabase.ts';
import { progressReporter } from './progressReporter.ts';

// npm run lab:export -- --out <file> [--lab <id or name>]: one lab as an archive file.
const command = 'lab:export';
try {
  const { values } = parseArgs({ options: { out: { type: 'string' }, lab: { type: 'string' } } });
  if (!values.out) throw new Error('Say where to write the archive: npm run lab:export -- --out lab.flarchive [--lab <id or name>]');
  const handle = await openScriptDatabase(command);
  const partial = `${values.out}.partial`;
  try {
    const lab = await findLab(handle.db, values.lab);
    process.stderr.write(`${command}: exporting lab "${lab.name}" (${lab.id})\n`);
    const started = Date.now();
    const archive = labArchiveStream(handle.db, lab.id, progressReporter(command));
    // Written beside the target and renamed at the end, so a failed export leaves no file that looks whole.
    await pipeline(Readable.fromWeb(archive as never), createWriteStream(partial));
    await rename(partial, values.out);
    console.log(`Exported lab "${lab.name}" (${lab.id}) to ${values.out} in ${((Date.now() - started) / 1000).toFixed(1)} s.`);
  } catch (error) {
    await rm(partial, { force: true });
    throw error;
  } finally {
    await handle.close();
  }
} catch (error) {
  console.error(`${command}: ${(error as Error).message}`);
  process.exitCode = 1;
}
