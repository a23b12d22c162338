/**
 * An instant as the pages print it: UTC, to the minute, the form a lab notebook uses.
 *
 * @example
 * formatInstant(new Date('2026-11-21T14:05:31Z')); // '2026-11-21 14:05 UTC'
 */
export function formatInstant(at: Date | string | null | undefined): string {
  if (at === null || at === undefined) return '—';
  const d = typeof at === 'string' ? new Date(at) : at;
  if (Number.isNaN(d.getTime())) return '—';
  return `${d.toISOString().slice(0, 16).replace('T', ' ')} UTC`;
}
