import type { ArchiveProgress } from '../db/archive/ArchiveProgress.ts';

const EVERY_MS = 500;

/**
 * Progress on stderr, at most twice a second and at the end of each part, so a large lab shows
 * rows per table and the share of the whole without flooding a log.
 *
 * @example
 * progressReporter('lab:export')({ phase: 'export', part: 'readings', partRows: 40000, partTotal: 100000, doneRows: 40500, totalRows: 100600 });
 * // stderr: lab:export  export  readings  40000/100000 rows  (40% of the lab)
 */
export function progressReporter(command: string): ArchiveProgress {
  let last = 0;
  return (event) => {
    const now = Date.now();
    const partDone = event.partRows === event.partTotal;
    if (!partDone && now - last < EVERY_MS) return;
    last = now;
    const percent = event.totalRows === 0 ? 100 : Math.floor((100 * event.doneRows) / event.totalRows);
    process.stderr.write(`${command}  ${event.phase}  ${event.part}  ${event.partRows}/${event.partTotal} rows  (${percent}% of the lab)\n`);
  };
}
