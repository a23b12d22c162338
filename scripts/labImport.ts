import { createReadStream } from 'node:fs';
import { parseArgs } from 'node:util';
import { importLabArchive } from '../db/archive/importLabArchive.ts';
import { openScriptDatabase } from './openScriptDatabase.ts';
import { progressReporter } from './progressReporter.ts';

// npm run lab:import -- --in <file>: the archive's lab as a new lab here, with a fresh admin key.
const command = 'lab:import';
try {
  const { values } = parseArgs({ options: { in: { type: 'string' } } });
  if (!values.in) throw new Error('Name the archive to import: npm run lab:import -- --in lab.flarchive');
  const handle = await openScriptDatabase(command);
  try {
    const started = Date.now();
    const summary = await importLabArchive(handle.db, { newLab: true }, createReadStream(values.in), progressReporter(command));
    const upgraded = summary.schema.upgradedThrough.length > 0 ? `; archive schema ${summary.schema.archive}, columns added since took their defaults` : '';
    console.log(`Imported lab "${summary.labName}" (${summary.labId}): ${summary.totalRows} records in ${((Date.now() - started) / 1000).toFixed(1)} s${upgraded}.`);
    console.log('Keys are never archived. The lab\'s new admin key, shown once and stored only as a hash:');
    console.log(`  admin      ${summary.adminKey!.secret}`);
  } finally {
    await handle.close();
  }
} catch (error) {
  console.error(`${command}: ${(error as Error).message}`);
  process.exitCode = 1;
}
