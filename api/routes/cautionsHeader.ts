/** Cautions as one header value; percent-encoded if a future caution leaves printable ASCII. */
export function cautionsHeader(cautions: readonly string[]): string {
  const joined = cautions.join(' | ');
  return /^[\x20-\x7e]*$/.test(joined) ? joined : encodeURIComponent(joined);
}
