import { DomainError } from '../../../src/errors/DomainError.ts';

/**
 * The body as text, refusing invalid UTF-8 instead of storing replacement characters in
 * operator names and notes. The row is where the first bad byte sits, counted by lines.
 */
export function decodeImportText(body: Uint8Array): string {
  try {
    return new TextDecoder('utf-8', { fatal: true, ignoreBOM: false }).decode(body);
  } catch {
    const lenient = new TextDecoder('utf-8').decode(body);
    const row = lenient.slice(0, lenient.indexOf('\uFFFD')).split('\n').length;
    throw new DomainError('invalid_input', 'The file is not valid UTF-8; save it as UTF-8 and try again. Nothing was imported.', [
      { row, field: 'file', message: 'invalid UTF-8 byte sequence on this line' },
    ]);
  }
}
