/**
 * The entity tag of a reading: a reading never changes except by gaining a successor, so its id
 * and the successor's (or "current") name the representation exactly. It is a strong tag
 * because If-Match compares strongly (RFC 9110, 13.1.1): a weak tag could never match there.
 */
export function readingEtag(reading: { id: string; supersededById: string | null }): string {
  return `"${reading.id}:${reading.supersededById ?? 'current'}"`;
}

