import { stringify } from 'csv-stringify/sync';
import { exportCsvRecord } from './exportCsvRecord.ts';
import { exportJsonReading } from './exportJsonReading.ts';
import type { ExportedReading } from './exportReadings.ts';
import { EXPORT_COLUMNS } from './readingTransferColumns.ts';

/**
 * Encodes pages of readings as the text of a CSV file (header first) or of a JSON document
 * `{ "readings": [...] }` that the import accepts as it is. One chunk per page.
 *
 * @example
 * for await (const chunk of readingExportText(pages, 'csv')) process.stdout.write(chunk);
 * // id,model_code,site_label,stage,…
 * // 4c1e…,UN-07,upper notch root,before_load,,2026-11-21T14:05:00.000Z,…
 */
export async function* readingExportText(pages: AsyncIterable<ExportedReading[]>, format: 'csv' | 'json'): AsyncGenerator<string> {
  let first = true;
  if (format === 'csv') {
    for await (const page of pages) {
      yield stringify(page.map(exportCsvRecord), { header: first, columns: [...EXPORT_COLUMNS] });
      first = false;
    }
    if (first) yield stringify([], { header: true, columns: [...EXPORT_COLUMNS] });
    return;
  }
  yield '{"readings":[';
  for await (const page of pages) {
    yield (first ? '\n' : ',\n') + page.map((r) => JSON.stringify(exportJsonReading(r))).join(',\n');
    first = false;
  }
  yield '\n]}\n';
}
